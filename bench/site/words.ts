/**
 * Vocabulary of the synthetic sites: a common vocabulary shared by every page (ordinary words of
 * technical writing), function words, and invented topic words built from syllables, so that
 * each topic cluster has terms of its own and relatedness between pages is meaningful.
 */
import type { Random } from './prng.js';
import { intBetween, pick } from './prng.js';

/** Function words: frequent, removed by the stop-word list of the text stage. */
export const FUNCTION_WORDS: readonly string[] = [
  'the', 'a', 'an', 'of', 'to', 'in', 'and', 'or', 'is', 'are', 'for', 'with', 'on', 'by', 'this',
  'that', 'it', 'as', 'be', 'can', 'you', 'your', 'when', 'from', 'at', 'not', 'each', 'will',
  'which', 'if', 'then', 'after', 'before', 'all', 'any', 'its', 'more', 'also', 'into', 'only',
];

/** Words any page of a documentation site may use, whatever its topic. */
export const COMMON_WORDS: readonly string[] = [
  'configure', 'install', 'server', 'request', 'response', 'option', 'value', 'default', 'file',
  'folder', 'command', 'output', 'input', 'error', 'message', 'setting', 'project', 'build',
  'release', 'version', 'update', 'change', 'support', 'feature', 'example', 'guide', 'step',
  'start', 'stop', 'run', 'check', 'test', 'list', 'table', 'field', 'record', 'query', 'result',
  'limit', 'size', 'time', 'number', 'name', 'path', 'route', 'page', 'section', 'link', 'text',
  'format', 'parse', 'write', 'read', 'create', 'delete', 'remove', 'add', 'enable', 'disable',
  'access', 'account', 'user', 'group', 'role', 'permission', 'token', 'key', 'secret', 'policy',
  'network', 'port', 'host', 'address', 'client', 'service', 'worker', 'queue', 'job', 'task',
  'event', 'handler', 'callback', 'function', 'method', 'module', 'package', 'library', 'plugin',
  'extension', 'template', 'layout', 'theme', 'style', 'color', 'image', 'asset', 'cache', 'store',
  'memory', 'disk', 'storage', 'backup', 'restore', 'migrate', 'schema', 'model', 'object', 'array',
  'string', 'integer', 'boolean', 'list', 'map', 'index', 'search', 'filter', 'sort', 'order',
  'range', 'batch', 'stream', 'buffer', 'channel', 'signal', 'state', 'status', 'health', 'metric',
  'log', 'trace', 'debug', 'warning', 'notice', 'report', 'summary', 'detail', 'overview',
  'introduction', 'tutorial', 'reference', 'concept', 'pattern', 'practice', 'rule', 'limit',
  'quota', 'usage', 'billing', 'plan', 'region', 'zone', 'cluster', 'node', 'instance', 'volume',
  'image', 'container', 'deploy', 'rollback', 'upgrade', 'compatible', 'stable', 'experimental',
  'deprecated', 'secure', 'fast', 'simple', 'common', 'custom', 'global', 'local', 'remote',
  'shared', 'private', 'public', 'internal', 'external', 'optional', 'required', 'automatic',
  'manual', 'first', 'next', 'previous', 'last', 'new', 'old', 'large', 'small', 'main', 'extra',
  'describe', 'explain', 'show', 'return', 'accept', 'reject', 'retry', 'wait', 'send', 'receive',
  'connect', 'listen', 'open', 'close', 'lock', 'release', 'measure', 'compare', 'choose', 'keep',
];

/** Verbs used to start page titles. */
export const TITLE_VERBS: readonly string[] = [
  'Configuring', 'Installing', 'Using', 'Understanding', 'Managing', 'Troubleshooting', 'Testing',
  'Deploying', 'Monitoring', 'Securing', 'Scaling', 'Migrating', 'Writing', 'Reading', 'Tuning',
];

const ONSETS = ['b', 'd', 'f', 'g', 'k', 'l', 'm', 'n', 'p', 'r', 's', 't', 'v', 'z', 'br', 'dr', 'kl', 'pr', 'st', 'tr', 'sh', 'ch', 'qu', 'gr'];
const NUCLEI = ['a', 'e', 'i', 'o', 'u', 'ai', 'ou', 'ea', 'io'];

/**
 * Invent one pseudo-word of 2-3 syllables that is not in `taken`, and record it there.
 * Words end in a consonant so that stemming leaves distinct words distinct most of the time.
 */
export function inventWord(rnd: Random, taken: Set<string>): string {
  for (;;) {
    const syllables = intBetween(rnd, 2, 3);
    let w = '';
    for (let s = 0; s < syllables; s++) w += pick(rnd, ONSETS) + pick(rnd, NUCLEI);
    w += pick(rnd, ['n', 'r', 'l', 'x', 'th', 'm', 'k', 'v']);
    if (!taken.has(w)) {
      taken.add(w);
      return w;
    }
  }
}

/** Upper-case the first letter. */
export function capitalize(word: string): string {
  return word.length === 0 ? word : word[0]!.toUpperCase() + word.slice(1);
}
