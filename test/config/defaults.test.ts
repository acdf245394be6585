/**
 * Every default is written once, as a value in the schema (src/config/options.ts); the
 * documented `Config` type (src/config/config.ts) says it again for users in `@default` tags.
 * This test reads those tags (config.ts is plain interfaces: a doc comment, then `key?: type;`)
 * and checks each against
 * `DEFAULT_OPTIONS`, so the documentation cannot drift from the values. (The type test
 * test/types/config.test-d.ts keeps the keys and types equal.)
 */
import fs from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEFAULT_OPTIONS } from '../../src/config/options.js';

const file = fileURLToPath(new URL('../../src/config/config.ts', import.meta.url));

/** Interface -> where its keys are in the options. */
const PLACES: Record<string, readonly string[]> = {
  Config: [],
  RoutesConfig: ['routes'],
  GeneratedConfig: ['generated'],
  SuggestConfig: ['suggest'],
  LimitsConfig: ['limits'],
  CacheConfig: ['cache'],
};

/** Defaults that are said in words, not as a value, and what they stand for. */
const IN_WORDS: Record<string, unknown> = {
  limits: { brokenLinks: null, brokenFragments: null, orphans: null, unreachable: null, warnings: null, importantPageInlinks: null },
};

interface Documented {
  readonly key: string;
  readonly text: string | null;
}

function documentedDefaults(): Documented[] {
  const text = fs.readFileSync(file, 'utf8');
  const out: Documented[] = [];
  let place: readonly string[] | null = null;
  let doc: string | null = null;
  // Doc comments, interface heads, property lines and closing braces, in file order.
  const token = /(\/\*\*[\s\S]*?\*\/)|^export interface (\w+)\b[^{]*\{|^ {2}(\w+)\?: [^\n]*;$|^\}/gm;
  for (const m of text.matchAll(token)) {
    if (m[1] !== undefined) doc = m[1];
    else if (m[2] !== undefined) {
      place = PLACES[m[2]] ?? null;
      doc = null;
    } else if (m[3] !== undefined) {
      if (place !== null) out.push({ key: [...place, m[3]].join('.'), text: defaultTag(doc) });
      doc = null;
    } else place = null;
  }
  return out;
}

/** The text of a doc comment's `@default` tag (to the end of the comment), or null. */
function defaultTag(doc: string | null): string | null {
  if (doc === null) return null;
  const body = doc.replace(/^\/\*\*|\*\/$/g, '').replace(/^\s*\* ?/gm, '');
  const at = body.indexOf('@default');
  return at < 0 ? null : body.slice(at + '@default'.length).replace(/\s+/g, ' ').trim();
}

/** The value a `@default` text writes (a JavaScript literal, maybe followed by words in parentheses). */
function valueOf(text: string): unknown {
  const literal = text.replace(/\s*\([^)]*\)\s*$/, '');
  return new Function(`return (${literal});`)();
}

function optionAt(key: string): unknown {
  return key.split('.').reduce<unknown>((o, k) => (o as Record<string, unknown>)[k], DEFAULT_OPTIONS);
}

describe('the @default tags of Config are the schema defaults', () => {
  const documented = documentedDefaults();

  it('reads every key of the documented interfaces', () => {
    expect(documented.length).toBeGreaterThan(50);
    expect(documented.map((d) => d.key)).toEqual(expect.arrayContaining(['maxDepth', 'routes.basePath', 'suggest.impactLimit', 'cache.dir', 'generated.routes']));
  });

  it('every key has a @default tag', () => {
    expect(documented.filter((d) => d.text === null || d.text === '').map((d) => d.key)).toEqual([]);
  });

  it.each(documentDefaultsOnce())('%s', (key, text) => {
    const expected = optionAt(key);
    const written = key in IN_WORDS ? IN_WORDS[key] : valueOf(text);
    expect(written).toEqual(expected);
  });

  function documentDefaultsOnce(): [string, string][] {
    return documentedDefaults().map((d) => [d.key, d.text ?? '']);
  }
});
