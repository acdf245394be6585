/**
 * Shape checks for what is read back from the cache: the header of a shard file and each entry.
 * Nothing read from disk is trusted before it passes these. Hand-written loops rather than a zod
 * schema: they run over every link of every cached page on each warm run, and plain `typeof`
 * checks cost a few nanoseconds per field where a schema parse builds a new object for each.
 */
import type { CodeSpan, Heading, ProtectedKind, ProtectedRegion, RawLink, SourceProblem, TextSpan } from '../types.js';
import type { ShardHeader, StoredFacts } from './format.js';

type Unknown = Record<string, unknown>;

function isObject(v: unknown): v is Unknown {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function isInt(v: unknown): v is number {
  return typeof v === 'number' && Number.isInteger(v);
}

function optional(v: unknown, type: 'string' | 'boolean' | 'number'): boolean {
  return v === undefined || typeof v === type;
}

function isStringArray(v: unknown): v is string[] {
  if (!Array.isArray(v)) return false;
  for (const s of v) if (typeof s !== 'string') return false;
  return true;
}

/** A parsed header line, or null when it is not one. */
export function asHeader(v: unknown): ShardHeader | null {
  if (!isObject(v)) return null;
  const { schema, version, fingerprint, shard, count } = v;
  if (typeof schema !== 'string' || typeof version !== 'string' || typeof fingerprint !== 'string') return null;
  if (!isInt(shard) || !isInt(count) || count < 0) return null;
  return { schema, version, fingerprint, shard, count };
}

const ORIGINS = new Set<unknown>(['markdown', 'html', 'pattern', 'navigation']);
const CONTEXTS = new Set<unknown>(['content', 'template']);
const KINDS = new Set<unknown>(['markdown', 'html']);
const IMPORTANCE = new Set<unknown>([undefined, 'high', 'normal', 'low']);
const PROBLEM_CODES = new Set<unknown>([
  'invalid-utf8',
  'too-large',
  'binary',
  'unreadable',
  'frontmatter',
  'parse-failed',
  'bad-link-pattern',
  'too-many-links',
  'deep-nesting',
] satisfies SourceProblem['code'][]);

function isLink(v: unknown): v is RawLink {
  if (!isObject(v)) return false;
  return (
    typeof v.href === 'string' &&
    typeof v.text === 'string' &&
    isInt(v.line) &&
    isInt(v.column) &&
    CONTEXTS.has(v.context) &&
    typeof v.nofollow === 'boolean' &&
    ORIGINS.has(v.origin) &&
    optional(v.fileRelative, 'boolean') &&
    (v.code === undefined || v.code === true)
  );
}

function isHeading(v: unknown): v is Heading {
  return (
    isObject(v) &&
    isInt(v.depth) &&
    typeof v.text === 'string' &&
    typeof v.slug === 'string' &&
    isInt(v.line) &&
    isInt(v.column)
  );
}

function isProblem(v: unknown): v is SourceProblem {
  return (
    isObject(v) &&
    PROBLEM_CODES.has(v.code) &&
    typeof v.message === 'string' &&
    (v.line === undefined || isInt(v.line)) &&
    (v.column === undefined || isInt(v.column))
  );
}

function isSpan(v: unknown): v is TextSpan {
  return isObject(v) && typeof v.text === 'string' && typeof v.code === 'string' && isInt(v.offset) && isInt(v.line) && isInt(v.column);
}

function isSpans(v: unknown): boolean {
  if (!Array.isArray(v)) return false;
  if (v.length === 0) return true;
  if (typeof v[0] === 'number') {
    if (v.length % 4 !== 0) return false;
    for (const n of v) if (!isInt(n)) return false;
    return true;
  }
  for (const s of v) if (!isSpan(s)) return false;
  return true;
}

const PROTECTED_KINDS = new Set<unknown>([
  'shortcode',
  'template-tag',
  'template-block',
  'mdx-jsx',
  'mdx-expression',
  'braces',
  'html-tag',
  'html-comment',
  'front-matter',
  'link-definition',
  'container-marker',
  'attribute-list',
  'link',
  'code',
] satisfies ProtectedKind[]);

function isRegion(v: unknown): v is ProtectedRegion {
  return Array.isArray(v) && v.length === 3 && isInt(v[0]) && isInt(v[1]) && v[1] >= v[0] && PROTECTED_KINDS.has(v[2]);
}

function isCodeSpan(v: unknown): v is CodeSpan {
  return isObject(v) && typeof v.text === 'string' && isInt(v.offset) && isInt(v.endOffset) && v.endOffset > v.offset && isInt(v.line) && isInt(v.column);
}

function every<T>(v: unknown, check: (x: unknown) => x is T): boolean {
  if (!Array.isArray(v)) return false;
  for (const x of v) if (!check(x)) return false;
  return true;
}

function isMeta(v: unknown): boolean {
  return (
    isObject(v) &&
    typeof v.draft === 'boolean' &&
    typeof v.noindex === 'boolean' &&
    typeof v.exclude === 'boolean' &&
    isStringArray(v.aliases) &&
    optional(v.slug, 'string') &&
    optional(v.permalink, 'string') &&
    IMPORTANCE.has(v.importance)
  );
}

/** True when `v` has the full shape of stored facts (every field of `PageFacts`, spans packed or not). */
export function isStoredFacts(v: unknown): v is StoredFacts {
  if (!isObject(v)) return false;
  const text = v.text;
  return (
    typeof v.file === 'string' &&
    KINDS.has(v.kind) &&
    typeof v.hash === 'string' &&
    typeof v.route === 'string' &&
    typeof v.title === 'string' &&
    isMeta(v.meta) &&
    every(v.headings, isHeading) &&
    isStringArray(v.ids) &&
    every(v.links, isLink) &&
    optional(v.baseHref, 'string') &&
    isObject(text) &&
    typeof text.title === 'string' &&
    typeof text.headings === 'string' &&
    typeof text.body === 'string' &&
    isSpans(v.spans) &&
    (v.codeSpans === undefined || every(v.codeSpans, isCodeSpan)) &&
    every(v.protected, isRegion) &&
    every(v.problems, isProblem)
  );
}
