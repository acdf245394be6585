/**
 * One-line messages for configuration errors: the full dotted key, what was given and what the
 * key accepts (the keys of an object, the values of an enum, the range of a number), read from
 * the zod schema itself so the message can never disagree with the validation.
 */
import { z } from 'zod';

/** The schema node a path leads to, through defaults, optionals, pipes, arrays and records. */
function schemaAt(root: z.ZodType, path: readonly PropertyKey[]): z.ZodType | null {
  let node: z.ZodType | null = unwrap(root);
  for (const key of path) {
    if (node instanceof z.ZodObject) node = (node.shape as Record<string, z.ZodType>)[String(key)] ?? null;
    else if (node instanceof z.ZodArray) node = node.element as z.ZodType;
    else if (node instanceof z.ZodRecord) node = node.valueType as z.ZodType;
    else if (node instanceof z.ZodTuple) node = (node.def.items[Number(key)] as z.ZodType | undefined) ?? null;
    else return null;
    if (node === null) return null;
    node = unwrap(node);
  }
  return node;
}

/** Defaults, prefaults, optionals and transforms stand for the schema they wrap. */
function unwrap(node: z.ZodType): z.ZodType {
  let n = node;
  for (;;) {
    if (n.description !== undefined) return n;
    if (n instanceof z.ZodDefault || n instanceof z.ZodPrefault || n instanceof z.ZodOptional) n = n.unwrap() as z.ZodType;
    else if (n instanceof z.ZodPipe) n = n.in as z.ZodType;
    else return n;
  }
}

/**
 * What a schema node accepts, in words: `a whole number >= 0`, `a number from 0 to 1`,
 * `one of "a", "b"`, `a list of non-empty strings`, `true or false`... A node's `.describe()`
 * text wins.
 */
export function describeAccepted(node: z.ZodType): string {
  const n = unwrap(node);
  if (n.description !== undefined) return n.description;
  if (n instanceof z.ZodNullable) return `${describeAccepted(n.unwrap() as z.ZodType)}, or null`;
  if (n instanceof z.ZodEnum) return `one of ${n.options.map((v) => JSON.stringify(v)).join(', ')}`;
  if (n instanceof z.ZodBoolean) return 'true or false';
  if (n instanceof z.ZodNumber) return describeNumber(n);
  if (n instanceof z.ZodString) return n.minLength !== null && n.minLength > 0 ? 'a non-empty string' : 'a string';
  if (n instanceof z.ZodArray) {
    const min = (n.def.checks ?? []).map((c) => c._zod.def).find((d) => (d as { check: string }).check === 'min_length') as { minimum?: number } | undefined;
    const element = describeAccepted(n.element as z.ZodType).replace(/^an? /, '').replace(/\b(string|object|number)\b/, '$1s');
    return `a list of ${element}${min?.minimum ? ` (at least ${min.minimum})` : ''}`;
  }
  if (n instanceof z.ZodObject) return `an object with the keys ${Object.keys(n.shape).join(', ')}`;
  if (n instanceof z.ZodRecord) return 'an object';
  if (n instanceof z.ZodUnion) return n.options.map((o) => describeAccepted(o as z.ZodType)).join(', or ');
  if (n instanceof z.ZodTuple) return `[${n.def.items.map((i) => describeAccepted(i as z.ZodType)).join(', ')}]`;
  return n.def.type;
}

function describeNumber(n: z.ZodNumber): string {
  const what = n.isInt ? 'a whole number' : 'a number';
  let low: { value: number; inclusive: boolean } | null = null;
  let high: { value: number; inclusive: boolean } | null = null;
  for (const check of n.def.checks ?? []) {
    const d = check._zod.def as { check: string; value?: number; inclusive?: boolean };
    if (d.check === 'greater_than') low = { value: d.value!, inclusive: d.inclusive === true };
    if (d.check === 'less_than') high = { value: d.value!, inclusive: d.inclusive === true };
  }
  if (low !== null && high !== null && low.inclusive && high.inclusive) return `${what} from ${low.value} to ${high.value}`;
  const parts: string[] = [];
  if (low !== null) parts.push(`${low.inclusive ? '>=' : '>'} ${low.value}`);
  if (high !== null) parts.push(`${high.inclusive ? '<=' : '<'} ${high.value}`);
  return parts.length === 0 ? what : `${what} ${parts.join(' and ')}`;
}

/** A given value, short, for a message. */
function shown(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (Array.isArray(value)) return value.length === 0 ? 'an empty list' : `a list of ${value.length}`;
  const text = value !== null && typeof value === 'object' ? 'an object' : JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/**
 * One line for the first issue of a failed parse of `schema`: `key "routes.styel": unknown key;
 * accepted keys of "routes": style, basePath, ...` or `key "maxDepth": expected a whole number
 * >= 0, got -1`. The caller prefixes where the configuration came from.
 * @param issue an issue of `schema.safeParse(input, { reportInput: true })`
 */
export function describeIssue(schema: z.ZodType, issue: z.core.$ZodIssue): string {
  const path = issue.path;
  const dotted = (p: readonly PropertyKey[]) => p.map(String).join('.');
  if (issue.code === 'unrecognized_keys') {
    const node = schemaAt(schema, path);
    const [first, ...more] = issue.keys;
    const owner = path.length === 0 ? 'accepted keys' : `accepted keys of "${dotted(path)}"`;
    const keys = node instanceof z.ZodObject ? Object.keys(node.shape).join(', ') : '';
    const also = more.length > 0 ? ` (also unknown: ${more.map((k) => `"${k}"`).join(', ')})` : '';
    return `key "${dotted([...path, first!])}": unknown key${also}; ${owner}: ${keys}`;
  }
  if (path.length === 0 && issue.code === 'invalid_type') {
    return `the configuration must be an object of keys, got ${'input' in issue ? shown(issue.input) : 'nothing'}`;
  }
  return `key "${dotted(path)}": ${expectedGot(schema, issue)}`;
}

/**
 * `expected <what the key accepts>, got <the value>` for an issue of `schema` (parsed with
 * `reportInput: true`) other than an unknown key.
 */
export function expectedGot(schema: z.ZodType, issue: z.core.$ZodIssue): string {
  const node = schemaAt(schema, issue.path);
  const expected = node === null ? issue.message : describeAccepted(node);
  return `expected ${expected}, got ${'input' in issue ? shown(issue.input) : 'nothing'}`;
}

/** Old rule ids and their names now. */
const RENAMED_CHECKS: Readonly<Record<string, string>> = { 'max-click-depth': 'click-depth' };

/** Old `gate` keys and their names under `limits` now (`maxDepth` has none: see below). */
const RENAMED_LIMITS: Readonly<Record<string, string>> = {
  maxOrphans: 'orphans',
  maxBrokenLinks: 'brokenLinks',
  maxBrokenFragments: 'brokenFragments',
  maxUnreachable: 'unreachable',
  maxWarnings: 'warnings',
  minInlinksForImportant: 'importantPageInlinks',
};

const OLD_LEVELS: Readonly<Record<string, string>> = { off: 'none', warn: 'warning', warning: 'warning', error: 'error' };

const isRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);

/**
 * The old rule-settings form (`"rules": { "id": "warn" | ["error", { ... }] }`) and the old
 * `"gate"` limits, rewritten in today's form, as one line that says how to write them now; null
 * when the configuration uses neither. The rewrite is computed from the user's own values, so
 * the line can be pasted back.
 */
export function oldFormProblem(input: unknown): string | null {
  if (!isRecord(input)) return null;
  const parts: string[] = [];
  if ('rules' in input) parts.push(oldRules(input.rules));
  if ('gate' in input) parts.push(oldGate(input.gate));
  if (isRecord(input.suggest) && 'maxNewLinksPerPage' in input.suggest) {
    parts.push(`key "suggest.maxNewLinksPerPage" is now "suggest.perSource" (0 = no cap): write "perSource": ${JSON.stringify(input.suggest.maxNewLinksPerPage)}`);
  }
  return parts.length === 0 ? null : parts.join('; ');
}

function oldRules(rules: unknown): string {
  if (!isRecord(rules)) return 'key "rules" is no longer read: write "checks": { "<check id>": { "level": "error", "warning" or "none" } }';
  const checks: Record<string, Record<string, unknown>> = {};
  let maxDepth: unknown;
  for (const [id, setting] of Object.entries(rules)) {
    const [level, options] = Array.isArray(setting) ? [setting[0], isRecord(setting[1]) ? setting[1] : {}] : [setting, {}];
    const rest: Record<string, unknown> = { ...options };
    if (id === 'max-click-depth' && 'max' in rest) {
      if (rest.max !== null) maxDepth = rest.max;
      delete rest.max;
    }
    checks[RENAMED_CHECKS[id] ?? id] = { level: typeof level === 'string' ? (OLD_LEVELS[level] ?? level) : level, ...rest };
  }
  const depth = maxDepth === undefined ? '' : ` and "maxDepth": ${JSON.stringify(maxDepth)} (the one depth limit)`;
  return `key "rules" is the old form of check settings; write it now as "checks": ${JSON.stringify(checks)}${depth}`;
}

function oldGate(gate: unknown): string {
  if (!isRecord(gate)) return 'key "gate" is now "limits"';
  const limits: Record<string, unknown> = {};
  let depth = '';
  for (const [key, value] of Object.entries(gate)) {
    if (key === 'maxDepth') {
      if (value !== null) depth = `; "gate.maxDepth" is gone: the depth limit is "maxDepth", and "checks": {"click-depth":{"level":"error"}} fails the run on it`;
    } else {
      limits[RENAMED_LIMITS[key] ?? key] = value;
    }
  }
  return `key "gate" is now "limits"; write it as "limits": ${JSON.stringify(limits)}${depth}`;
}
