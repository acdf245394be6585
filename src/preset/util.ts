/** Small helpers the preset readers share. */
import { parse as parseToml } from 'smol-toml';
import { parse as parseYaml } from 'yaml';

/** A parsed config file, or the reason it did not parse. */
export type Parsed = { readonly ok: true; readonly value: Record<string, unknown> } | { readonly ok: false; readonly error: string };

/**
 * Parse a TOML, YAML or JSON config file by its extension. Never throws.
 * @param file its path (the extension picks the format)
 * @param text its content
 */
export function parseConfigText(file: string, text: string): Parsed {
  try {
    let value: unknown;
    if (/\.toml$/i.test(file)) value = parseToml(text);
    else if (/\.json$/i.test(file)) value = JSON.parse(text);
    // mkdocs.yml files use Python tags (`!!python/name:...`, `!ENV`): read as plain values.
    else value = parseYaml(text, { logLevel: 'silent', uniqueKeys: false, customTags: pythonTags as never });
    return isRecord(value) ? { ok: true, value } : { ok: true, value: {} };
  } catch (error) {
    return { ok: false, error: (error as Error).message.split('\n')[0] };
  }
}

const pythonTags = (tags: unknown[]): unknown[] => [
  ...tags,
  ...['!ENV', '!relative', 'tag:yaml.org,2002:python/name', 'tag:yaml.org,2002:python/object/apply'].map((tag) => ({
    tag,
    resolve: (value: unknown) => value,
  })),
];

/** True for a plain object. */
export function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** `obj.a.b.c` when every step is an object, else undefined. */
export function dig(obj: unknown, ...keys: string[]): unknown {
  let v = obj;
  for (const k of keys) {
    if (!isRecord(v)) return undefined;
    v = v[k];
  }
  return v;
}

/** A string value, trimmed, or undefined. */
export function str(v: unknown): string | undefined {
  return typeof v === 'string' && v.trim() !== '' ? v.trim() : undefined;
}

/**
 * The path part of a site URL as a base path (`https://x.org/docs` -> `/docs/`; `/` when there
 * is none). Null when the value is no URL or path.
 */
export function basePathOf(url: string | undefined): string | null {
  if (url === undefined) return null;
  let path: string;
  try {
    path = new URL(url, 'https://site.invalid/').pathname;
  } catch {
    return null;
  }
  return path.endsWith('/') ? path : `${path}/`;
}

/** A folder as shown in the summary (`src/`), or `./` for the site folder. */
export function shownFolder(dir: string): string {
  const d = dir.replace(/^\.\/?/, '').replace(/\/+$/, '');
  return d === '' ? './' : `${d}/`;
}

/** A folder relative to the site folder without `./` and trailing slashes (`''` for the folder itself). */
export function cleanFolder(dir: string): string {
  return dir.replace(/^(?:\.\/)+/, '').replace(/^\.$/, '').replace(/\/+$/, '');
}

/** `n thing(s)`. */
export function count(n: number, thing: string): string {
  return `${n} ${thing}${n === 1 ? '' : 's'}`;
}

/**
 * Keep only the lines of a top-level YAML key's block (other lines emptied), so a reader of
 * link lists sees that block alone with the file's own line numbers. Null when the key is absent.
 */
export function yamlBlock(text: string, key: string): string | null {
  const lines = text.split('\n');
  const start = lines.findIndex((l) => new RegExp(`^${key}\\s*:`).test(l));
  if (start < 0) return null;
  let end = start + 1;
  while (end < lines.length && (lines[end].trim() === '' || /^[\s#-]/.test(lines[end]))) end++;
  return lines.map((l, i) => (i >= start && i < end ? l : '')).join('\n');
}
