/**
 * The names of a target page an anchor may match (see `anchor.ts`): its title, its aliases (the
 * words of the last segment of its route and of its frontmatter aliases) and its key terms, as
 * Porter stems.
 */
import { SOURCE_EXTENSION_END } from '../routes/index.js';
import { forEachWord, tokenize } from '../text/tokenize.js';
import type { StemCache } from '../text/tokenize.js';

/** A name of the target (its title or an alias) as stems, with the stems a partial match must include. */
export interface TargetName {
  readonly stems: readonly string[];
  /** The rarest stems of the name (smallest document frequency). */
  readonly rarest: ReadonlySet<string>;
}

/** The words of a target page an anchor may match. */
export interface TargetNames {
  readonly title: TargetName;
  /** Each alias (route segment words); none equal to the title. */
  readonly aliases: readonly TargetName[];
  /** Stems of the target's key terms. */
  readonly keyTerms: ReadonlySet<string>;
  /** Key terms for which the target is among the pages they weigh most in (a run needs one). */
  readonly strongTerms: ReadonlySet<string>;
  /** Stems of the title and the aliases (a run of key terms needs one). */
  readonly nameWords: ReadonlySet<string>;
}

/** A target's key terms (heaviest first) and the strong ones among them. */
export interface KeyTerms {
  readonly all: readonly string[];
  readonly strong: readonly string[];
}

/** Stems of the words of the last segment of a route or alias (`/guide/cache-server/` -> cach, server). */
export function routeWords(route: string, cache: StemCache): string[] {
  return tokenize(routeSegmentText(route), cache);
}

/** The last segment of a route as written, decoded, without a source extension, separators as spaces (`/api/n-api/` -> `n api`). */
export function routeSegmentText(route: string): string {
  const segments = route.split('/').filter((s) => s !== '');
  const last = segments[segments.length - 1];
  if (last === undefined) return '';
  let decoded = last;
  try {
    decoded = decodeURIComponent(last);
  } catch {
    // keep the segment as written
  }
  return decoded.replace(SOURCE_EXTENSION_END, '').replace(/[-_.+~]+/g, ' ');
}

/**
 * Whether the tokenizer kept every word of a route's last segment (`stems` of them): a route it
 * partly drops names nothing (`/n-api/` is not "API"), as in the mention index.
 */
function wholeRoute(route: string, stems: number): boolean {
  let written = 0;
  forEachWord(routeSegmentText(route), () => void written++);
  return written === stems;
}

/**
 * The names of a target page.
 * @param keyTerms the target's key terms; in a plain list every term counts as strong
 * @param df document frequency of a stem (0 when the index does not know it)
 */
export function targetNames(
  title: string,
  routes: readonly string[],
  keyTerms: readonly string[] | KeyTerms,
  cache: StemCache,
  df: (stem: string) => number = () => 0,
): TargetNames {
  const name = (stems: string[]): TargetName => {
    let min = Infinity;
    for (const s of stems) min = Math.min(min, df(s));
    return { stems, rarest: new Set(stems.filter((s) => df(s) === min)) };
  };
  const titleStems = tokenize(title, cache);
  const seen = new Set([titleStems.join(' ')]);
  const aliases: TargetName[] = [];
  for (const route of routes) {
    const words = routeWords(route, cache);
    const key = words.join(' ');
    if (words.length === 0 || seen.has(key) || !wholeRoute(route, words.length)) continue;
    seen.add(key);
    aliases.push(name(words));
  }
  const keys: KeyTerms = Array.isArray(keyTerms) ? { all: keyTerms, strong: keyTerms } : (keyTerms as KeyTerms);
  const nameWords = new Set([...titleStems, ...aliases.flatMap((a) => a.stems)]);
  return { title: name(titleStems), aliases, keyTerms: new Set(keys.all), strongTerms: new Set(keys.strong), nameWords };
}
