/**
 * The features of a candidate link source -> target, each as if the pair's own content links
 * were absent (the link model trains on the site's existing links; see `model.ts`):
 *
 * | feature              | what it measures                                                                 |
 * | -------------------- | -------------------------------------------------------------------------------- |
 * | similarity           | TF-IDF cosine similarity of the two pages                                        |
 * | title-mention        | the source's prose mentions the target's title (1/0)                             |
 * | anchor-text-mention  | ... a phrase other pages already link the target with (1/0)                      |
 * | label-mention        | ... the label of a navigation or template link to the target (1/0)               |
 * | alias-mention        | ... the words of the target's route or an alias (1/0)                            |
 * | heading-mention      | ... one of the target's section headings (1/0)                                   |
 * | mentions             | ln(1 + mentions of any of those names)                                           |
 * | name-words           | words of the longest name mentioned                                              |
 * | link-probability     | of the names mentioned, the highest share of a name's occurrences that are links |
 * | commonness           | ... the highest share of a name's links that point to this target                |
 * | adamic-adar          | ln(1 + Adamic-Adar over content links either way)                                |
 * | two-step-paths       | ln(1 + pages x with source -> x -> target)                                       |
 * | shared-folders       | leading route folders the two pages share                                        |
 * | target-inlinks       | ln(1 + distinct pages with a content link to the target)                         |
 * | source-outlinks      | ln(1 + distinct pages the source links to in its content)                        |
 * | source-rank          | PageRank percentile of the source                                                |
 * | target-depth         | the target's click depth without this pair, capped at 10 (unreachable: 10)       |
 *
 * "As if absent": a linked pair's own link texts count as prose mentions (the author's words
 * stay, the link goes), anchor texts only count when another page uses them, a phrase's link
 * counts leave out the pair's own links, and the link counts and depth leave out the pair.
 */
import type { Ranking, SiteGraph, TermIndex } from '../types.js';
import { EDGE_CONTENT } from '../graph/csr.js';
import { cosine } from '../text/tfidf.js';
import { hasContentLink } from './candidates.js';
import type { MentionIndex, NameKind } from './mentions.js';
import { nameKindsFor } from './mentions.js';
import type { Neighbours } from './proximity.js';
import { adamicAdar, depthWithout, sharedSegments, twoStepPaths } from './proximity.js';
import type { TargetRows } from './pair-sums.js';

/** Feature names, in the order of a feature vector. */
export const FEATURES = [
  'similarity',
  'title-mention',
  'anchor-text-mention',
  'label-mention',
  'alias-mention',
  'heading-mention',
  'mentions',
  'name-words',
  'link-probability',
  'commonness',
  'adamic-adar',
  'two-step-paths',
  'shared-folders',
  'target-inlinks',
  'source-outlinks',
  'source-rank',
  'target-depth',
] as const;

/** A feature's name. */
export type FeatureName = (typeof FEATURES)[number];

/** Index of each feature in a vector. */
export const F: Readonly<Record<FeatureName, number>> = Object.fromEntries(FEATURES.map((f, i) => [f, i])) as Record<FeatureName, number>;

/** The name evidence features (zeroed to score a pair as if its source did not mention the target). */
export const NAME_FEATURES: readonly number[] = [
  F['title-mention'],
  F['anchor-text-mention'],
  F['label-mention'],
  F['alias-mention'],
  F['heading-mention'],
  F.mentions,
  F['name-words'],
  F['link-probability'],
  F.commonness,
];

/** Depth given to an unreachable target, and the cap of every depth. */
export const DEPTH_CAP = 10;

/** Everything the features are computed from. */
export interface FeatureContext {
  readonly graph: SiteGraph;
  readonly ranking: Ranking;
  readonly index: TermIndex;
  readonly mentions: MentionIndex;
  readonly neighbours: Neighbours;
  /** PageRank percentile per page id. */
  readonly rankPct: ArrayLike<number>;
  /** 1 for entry pages. */
  readonly isEntry: Uint8Array;
  /** Distinct pages each page links to in its content (`contentOutlinks`). */
  readonly outlinks: Int32Array;
  /** Each page's route folders (`routeFolders`). */
  readonly folders: readonly (readonly string[])[];
  /**
   * The pairwise sums with the target's rows kept between calls (`pair-sums.ts`): the same
   * values, faster when consecutive pairs share their target. Without it the rows are merged.
   */
  readonly rows?: TargetRows;
}

const NONE: readonly number[] = [];

/** The feature vector of the pair. */
export function pairFeatures(ctx: FeatureContext, s: number, t: number): number[] {
  const { graph, ranking, mentions } = ctx;
  const x = new Array<number>(FEATURES.length).fill(0);
  const linked = hasContentLink(graph.forward, s, t);
  const sums = ctx.rows?.of(s, t);
  x[F.similarity] = sums !== undefined ? sums.similarity : mergedCosine(ctx.index, s, t);

  // Name evidence: prose mentions, plus (for a linked pair) the pair's own link texts.
  const hit = mentions.bySource[s]?.get(t);
  let count = hit === undefined ? 0 : hit.count;
  let phrases: readonly number[] = hit === undefined ? NONE : hit.phrases;
  let ownExact: Map<number, number> | null = null; // phrase -> the pair's own links with exactly this text
  if (linked) {
    const all = new Set(phrases);
    ownExact = new Map();
    for (const m of mentions.linkMatches[s] ?? []) {
      if (m.target !== t) continue;
      if (m.exact) ownExact.set(m.phrase, (ownExact.get(m.phrase) ?? 0) + 1);
      if (!mentions.phrases[m.phrase].names.some((r) => r.target === t)) continue;
      all.add(m.phrase);
      count++;
    }
    phrases = [...all];
  }
  let validCount = 0;
  for (const p of phrases) {
    const phrase = mentions.phrases[p];
    const kinds = nameKindsFor(phrase, s, t);
    if (kinds.length === 0) continue;
    validCount++;
    for (const k of kinds) x[kindFeature(k)] = 1;
    x[F['name-words']] = Math.max(x[F['name-words']], phrase.stems.length);
    const own = ownExact?.get(p) ?? 0;
    const linkedOcc = phrase.linked - own;
    const total = phrase.prose + phrase.linked;
    if (total > 0) x[F['link-probability']] = Math.max(x[F['link-probability']], linkedOcc / total);
    const toTarget = (phrase.linkedTo.get(t) ?? 0) - own;
    if (linkedOcc > 0) x[F.commonness] = Math.max(x[F.commonness], toTarget / linkedOcc);
  }
  x[F.mentions] = validCount === 0 ? 0 : Math.log1p(count);

  x[F['adamic-adar']] = Math.log1p(sums !== undefined ? sums.adamicAdar : adamicAdar(ctx.neighbours, s, t).adamicAdar);
  x[F['two-step-paths']] = Math.log1p(sums !== undefined ? sums.twoStep : twoStepPaths(graph, s, t));
  x[F['shared-folders']] = sharedSegments(ctx.folders[s], ctx.folders[t]);
  x[F['target-inlinks']] = Math.log1p(ranking.contentInlinks[t] - (linked ? 1 : 0));
  x[F['source-outlinks']] = Math.log1p(ctx.outlinks[s] - (linked ? 1 : 0));
  const pct = ctx.rankPct[s];
  x[F['source-rank']] = Number.isNaN(pct) ? 0 : pct;
  const d = linked ? depthWithout(graph, ranking, ctx.isEntry, s, t) : ranking.depth[t];
  x[F['target-depth']] = d < 0 ? DEPTH_CAP : Math.min(d, DEPTH_CAP);
  return x;
}

/** `cosine` of two pages, 0 when either has no row in the index. */
function mergedCosine(index: TermIndex, s: number, t: number): number {
  const rows = index.docOffsets.length - 1;
  return s < rows && t < rows ? cosine(index, s, t) : 0;
}

function kindFeature(kind: NameKind): number {
  switch (kind) {
    case 'title':
      return F['title-mention'];
    case 'anchor-text':
      return F['anchor-text-mention'];
    case 'label':
      return F['label-mention'];
    case 'alias':
      return F['alias-mention'];
    case 'heading':
      return F['heading-mention'];
  }
}

/** Per page: the distinct pages it links to with at least one content link. */
export function contentOutlinks(graph: SiteGraph): Int32Array {
  const n = graph.pages.length;
  const out = new Int32Array(n);
  for (let s = 0; s < n; s++) {
    for (let e = graph.forward.offsets[s]; e < graph.forward.offsets[s + 1]; e++) if ((graph.forward.flags[e] & EDGE_CONTENT) !== 0) out[s]++;
  }
  return out;
}

/** The vector with the name evidence zeroed: the pair as if the source did not mention the target. */
export function withoutNames(x: readonly number[]): number[] {
  const y = [...x];
  for (const j of NAME_FEATURES) y[j] = 0;
  return y;
}
