/**
 * The held-out sample of a backtest: a seeded share of the site's content links between pages,
 * removed from the in-memory page facts (never from the files) so the suggestion stage can try
 * to propose them again.
 *
 * - Unit: a (source, target) pair of pages. Holding a pair out removes every content link of
 *   the source to the target (a second link to the same page would otherwise keep the pair
 *   linked, and the suggestion stage never proposes a pair that is already linked).
 * - Eligible: pairs of content links (after template detection) between two different pages,
 *   neither excluded by `linkweave.exclude`. Template links (HTML `nav`/`header`/`footer`/
 *   `aside`, links repeated on `templateShare` of the pages, the navigation file) are never
 *   held out.
 * - Realistic remainder: a page keeps at least one content inlink; pairs are taken in a seeded
 *   random order (mulberry32, Fisher-Yates) and a pair whose target would lose its last content
 *   inlink is passed over.
 * - Size: round(share x eligible pairs), at least 1 when any pair is eligible; fewer when the
 *   inlink rule leaves fewer.
 * - The words: by default they go with the link, out of the page's text (the term index is
 *   rebuilt from what remains) and, as link text never is prose, nowhere an anchor could be
 *   proposed: as if the author had never written the link. With `keepLinkText` they stay in the
 *   page's text and become a prose span at their place: as if the author had written the
 *   words without a link (`unlink.ts`).
 * - The held-out set keeps each link's text and, where it can be located, its offsets.
 */
import type { PageFacts, RawLink, ResolvedLink, SiteGraph } from '../types.js';
import { shuffle, streamFor } from './prng.js';
import type { HeldOutLink, HeldOutPair } from './types.js';
import { buildLineIndex, positionOf } from '../util/line-index.js';
import type { LineIndex } from '../util/line-index.js';
import { linkTextRange, withCodeSpans, withoutWords, withSpans } from './unlink.js';
import type { TextRange } from './unlink.js';

/** A (source, target) pair of pages with its content links. */
export interface ContentPair {
  readonly source: number;
  readonly target: number;
  readonly links: readonly ResolvedLink[];
}

/** The pairs of content links between different pages, sorted by source then target. */
export function contentPairs(graph: SiteGraph): ContentPair[] {
  const byKey = new Map<number, ResolvedLink[]>();
  const n = graph.pages.length;
  for (const l of graph.links) {
    if (l.from < 0 || l.to < 0 || l.from === l.to || l.context !== 'content') continue;
    const key = l.from * n + l.to;
    const list = byKey.get(key);
    if (list === undefined) byKey.set(key, [l]);
    else list.push(l);
  }
  return [...byKey.keys()]
    .sort((a, b) => a - b)
    .map((key) => ({ source: Math.floor(key / n), target: key % n, links: byKey.get(key)! }));
}

/** Pairs that may be held out: neither page excluded. */
export function eligiblePairs(graph: SiteGraph, pairs: readonly ContentPair[]): ContentPair[] {
  // A pair with a link written in an included file cannot be held out from the page's own text.
  return pairs.filter((p) => !graph.pages[p.source].meta.exclude && !graph.pages[p.target].meta.exclude && !p.links.some((l) => l.raw.file !== undefined));
}

/** What `holdOut` needs. */
export interface HoldoutInput {
  readonly graph: SiteGraph;
  /** The facts given to `buildGraph` (`graph.pages[i].factsIndex` indexes them). */
  readonly facts: readonly PageFacts[];
  /** Decoded text of a source file by path, to turn removed links into prose; undefined if unknown. */
  readonly sourceText: (file: string) => string | undefined;
  /** `contentPairs(graph)`, when the caller has it already. */
  readonly pairs?: readonly ContentPair[];
  /** Turn the text of each removed link into a prose span (see `BacktestSettings.keepLinkText`). @default false */
  readonly keepLinkText?: boolean;
}

/** The facts with the held-out links removed, and what was held out. */
export interface Holdout {
  /** Same length and order as the input facts; unchanged pages are the same objects. */
  readonly facts: PageFacts[];
  /** Sorted by source, then target. */
  readonly heldOut: HeldOutPair[];
}

/**
 * Hold out a seeded share of the content-link pairs.
 * @param share in (0, 1]
 * @param seed any safe integer
 */
export function holdOut(input: HoldoutInput, share: number, seed: number): Holdout {
  const { graph } = input;
  const all = input.pairs ?? contentPairs(graph);
  const eligible = eligiblePairs(graph, all);
  const want = eligible.length === 0 ? 0 : Math.max(1, Math.round(share * eligible.length));

  const inlinksLeft = new Int32Array(graph.pages.length);
  for (const p of all) inlinksLeft[p.target]++;
  const chosen: number[] = [];
  for (const i of shuffle(streamFor(seed, 0), eligible.map((_, i) => i))) {
    if (chosen.length >= want) break;
    const t = eligible[i].target;
    if (inlinksLeft[t] < 2) continue;
    inlinksLeft[t]--;
    chosen.push(i);
  }
  chosen.sort((a, b) => a - b);
  return removePairs(input, chosen.map((i) => eligible[i]));
}

/** Remove every content link of the given pairs from the facts (pure; the input is not changed). */
export function removePairs(input: HoldoutInput, pairs: readonly ContentPair[]): Holdout {
  const { graph } = input;
  const removed = new Map<number, Set<RawLink>>();
  for (const p of pairs) {
    const f = graph.pages[p.source].factsIndex;
    const set = removed.get(f) ?? new Set<RawLink>();
    for (const l of p.links) set.add(l.raw);
    removed.set(f, set);
  }
  const facts = [...input.facts];
  const located = new Map<RawLink, TextRange | null>();
  const linesOf = new Map<number, LineIndex>();
  for (const [f, set] of removed) {
    const page = input.facts[f];
    const source = input.sourceText(page.file);
    const lines = source === undefined ? null : buildLineIndex(source);
    if (lines !== null) linesOf.set(f, lines);
    const ranges: TextRange[] = [];
    const codeRanges: TextRange[] = [];
    for (const raw of set) {
      const range = source === undefined || lines === null ? null : linkTextRange(source, lines, raw, page.kind);
      located.set(raw, range);
      if (range !== null) (range.code !== undefined ? codeRanges : ranges).push(range);
    }
    const keep = input.keepLinkText === true;
    const next: PageFacts = {
      ...page,
      links: page.links.filter((l) => !set.has(l)),
      text: keep ? page.text : withoutWords(page.text, [...set].map((l) => l.text)),
      spans: source === undefined || lines === null || !keep ? page.spans : withSpans(page.spans, source, lines, ranges),
    };
    // Code the author linked stays code: a place where a link may wrap it again.
    facts[f] = source === undefined || lines === null || !keep || codeRanges.length === 0 ? next : { ...next, codeSpans: withCodeSpans(page.codeSpans ?? [], source, lines, codeRanges) };
  }
  const heldOut = pairs.map((p): HeldOutPair => ({
    source: p.source,
    target: p.target,
    links: p.links.map((l): HeldOutLink => {
      const range = located.get(l.raw) ?? null;
      const lines = linesOf.get(graph.pages[p.source].factsIndex);
      return {
        textLine: range === null || lines === undefined ? l.raw.line : positionOf(lines, range.start).line,
        line: l.raw.line,
        column: l.raw.column,
        text: l.raw.text,
        offset: range === null ? -1 : range.start,
        endOffset: range === null ? -1 : range.end,
      };
    }),
  }));
  return { facts, heldOut };
}
