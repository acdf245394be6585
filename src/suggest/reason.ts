/**
 * The `reason` text of a suggestion, in plain words: why the target wants links, then the
 * strongest evidence the link model weighed for this pair (its largest positive parts of the
 * score), e.g. `orphan page (no inlinks); mentions "trait objects" twice (its title); 4 pages are
 * linked with both; same folder`. No internal key name is ever shown.
 */
import { anchorForReading } from '../parse/index.js';
import type { UnderlinkedReason } from '../types.js';
import type { AnchorMatch } from './anchor.js';
import { F, NAME_FEATURES } from './features.js';

/** Facts about the target that the reason mentions. */
export interface ReasonFacts {
  readonly reasons: readonly UnderlinkedReason[];
  readonly depth: number;
  readonly maxDepth: number;
  readonly contentInlinks: number;
  readonly minInlinks: number;
  readonly rankPercentile: number;
  readonly importancePercentile: number;
}

/** The pair's evidence: its features, each feature's part of the score, and the anchor. */
export interface Evidence {
  readonly features: readonly number[];
  readonly contributions: readonly number[];
  /** Per feature: the pair's value is above the training pairs' mean (the words say "high", "often"). */
  readonly above: readonly boolean[];
  readonly anchor: AnchorMatch | null;
  /** Pages linked with both (content links either way). */
  readonly commonNeighbours: number;
  /** Pages the source links to that link to the target. */
  readonly twoStep: number;
  /** The folder the two routes share ('' for none). */
  readonly folder: string;
}

/** Evidence items shown at most. */
export const EVIDENCE_SHOWN = 3;

/** The whole reason: why the target, then the evidence for this source. */
export function reasonText(f: ReasonFacts, e: Evidence): string {
  const why = targetReasons(f);
  const evidence = evidenceWords(e);
  const anchor = e.anchor === null ? 'no anchor phrase in the text: the link needs a sentence written by hand' : null;
  return [why, ...evidence, ...(anchor === null ? [] : [anchor])].join('; ');
}

/** Why the target wants links, e.g. `orphan page (no inlinks), 5 clicks deep (limit 3)`. */
export function targetReasons(f: ReasonFacts): string {
  const parts = f.reasons.map((r) => {
    switch (r) {
      case 'orphan':
        return 'orphan page (no inlinks)';
      case 'unreachable':
        return 'unreachable from the entry pages';
      case 'too-deep':
        return `${f.depth} clicks deep (limit ${f.maxDepth})`;
      case 'few-inlinks':
        return `important page with ${f.contentInlinks} content inlink${f.contentInlinks === 1 ? '' : 's'} (minimum ${f.minInlinks})`;
      case 'rank-below-importance':
        return `PageRank percentile ${pct(f.rankPercentile)} far below importance percentile ${pct(f.importancePercentile)}`;
    }
  });
  return parts.length > 0 ? parts.join(', ') : 'related page';
}

/** The strongest positive parts of the score, in words, largest first. */
export function evidenceWords(e: Evidence): string[] {
  const c = e.contributions;
  const x = e.features;
  const items: { weight: number; words: string }[] = [];
  const names = NAME_FEATURES.reduce((a, j) => a + (x[j] !== 0 ? c[j] : 0), 0);
  if (x[F.mentions] > 0 && e.anchor !== null) {
    const times = Math.round(Math.expm1(x[F.mentions]));
    const which =
      x[F['anchor-text-mention']] === 1
        ? 'the words other pages link it with'
        : x[F['title-mention']] === 1
          ? 'its title'
          : x[F['label-mention']] === 1
            ? 'its navigation label'
            : x[F['alias-mention']] === 1
              ? 'its route name'
              : 'one of its section headings';
    // The count is of every mention of any of the target's names, not of the anchor's phrase.
    const all = times === 2 ? ', and names it twice in all' : times > 2 ? `, and names it ${times} times in all` : '';
    items.push({ weight: names, words: `mentions "${anchorForReading(e.anchor.text)}" (${which})${all}` });
  }
  // Only what raised the score because the pair has more of it than the usual pair.
  if (x[F.mentions] === 0 && e.anchor !== null && e.anchor.kind !== 'name' && e.anchor.kind !== 'code') {
    // An anchor from the fallback search: part of a name, not one of the names the model weighed.
    const part = e.anchor.kind === 'title' ? 'part of its title' : e.anchor.kind === 'alias' ? "the words of its route" : 'its key terms';
    items.push({ weight: Number.POSITIVE_INFINITY, words: `"${e.anchor.text}" is ${part}` });
  }
  const add = (j: number, words: string): void => {
    if (e.above[j] === true) items.push({ weight: c[j], words });
  };
  add(F.similarity, `similar text (cosine ${x[F.similarity].toFixed(2)}, where 1 = the same words)`);
  if (e.commonNeighbours > 0) add(F['adamic-adar'], `${count(e.commonNeighbours, 'page')} ${e.commonNeighbours === 1 ? 'is' : 'are'} linked with both`);
  if (e.twoStep > 0) add(F['two-step-paths'], `links to ${count(e.twoStep, 'page')} that link to it`);
  if (e.folder !== '') add(F['shared-folders'], `same folder ${e.folder}`);
  add(F['target-inlinks'], `a page others link to often (${count(Math.round(Math.expm1(x[F['target-inlinks']])), 'page')})`);
  add(F['source-rank'], `the source ranks high (PageRank percentile ${pct(x[F['source-rank']])})`);
  add(F['source-outlinks'], `the source links out a lot (${count(Math.round(Math.expm1(x[F['source-outlinks']])), 'page')})`);
  return items
    .filter((i) => i.weight > 0.05)
    .sort((a, b) => b.weight - a.weight)
    .slice(0, EVIDENCE_SHOWN)
    .map((i) => i.words);
}

function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}

function pct(x: number): string {
  return String(Math.round(x * 100));
}
