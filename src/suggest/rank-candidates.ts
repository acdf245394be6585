/**
 * The choice part of the suggest stage, shared by `suggestLinks` and the backtest: the mention
 * index and the candidate pool -> the link model fitted on the site's own links -> every
 * candidate of the targets scored by the model -> anchors -> greedy choice under the
 * per-source and per-target caps (presentation limits, applied after ranking). Impact is not
 * part of it.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { LinkModelReport } from '../types.js';
import { ANCHOR_FEATURES } from './anchor-choice.js';
import { createStemCache } from '../text/tokenize.js';
import { termLeaders, topTerms } from '../text/tfidf.js';
import { findAnchors, prepareSource } from './anchor.js';
import type { AnchorMatch } from './anchor.js';
import { candidatePool, hasContentLink } from './candidates.js';
import { contentOutlinks, pairFeatures, withoutNames } from './features.js';
import type { FeatureContext } from './features.js';
import { predictLogistic } from './logistic.js';
import type { LogisticModel } from './logistic.js';
import { buildMentionIndex } from './mentions.js';
import type { MentionIndex } from './mentions.js';
import { fitLinkModel, trainingPairs } from './model.js';
import { targetNames } from './names.js';
import type { TargetNames } from './names.js';
import { contentNeighbours } from './proximity.js';
import { contributions } from './logistic.js';
import { adamicAdar, routeFolders, sharedSegments, twoStepPaths } from './proximity.js';
import type { Evidence } from './reason.js';
import { TargetRows } from './pair-sums.js';
import { pickUnderCaps } from './pick.js';
import type { Chosen, ScoredPair } from './pick.js';
import { factsByPage } from './facts-of.js';
import type { SuggestInput } from './types.js';

/** Key terms of a target that an anchor may match: its heaviest TF-IDF terms. */
export const KEY_TERMS = 5;
/** A key term is strong for a target among the pages it weighs most in (this many). */
export const STRONG_LEADERS = 3;

/** The choice and the model behind it. */
export interface RankedCandidates {
  /** In the order they were chosen (best score first, caps applied). */
  readonly chosen: Chosen[];
  readonly model: LogisticModel;
  readonly modelReport: LinkModelReport;
  readonly mentions: MentionIndex;
  /** A target's candidate sources (ascending; linked ones included). */
  readonly candidatesOf: (target: number) => number[];
  /** The evidence of a chosen pair, for its reason text. */
  readonly evidenceOf: (chosen: Chosen) => Evidence;
}

/**
 * The suggestions chosen for `targets`.
 * @param rankPct PageRank percentile per page id
 */
export function rankCandidates(input: SuggestInput, options: ResolvedOptions, targets: readonly number[], rankPct: ArrayLike<number>): RankedCandidates {
  const { graph, ranking, index, related } = input;
  const n = graph.pages.length;
  const factsOf = factsByPage(input);
  const settings = options.suggest;
  const cache = input.stems ?? createStemCache();

  const mentions = buildMentionIndex(graph, factsOf, cache);
  const neighbours = contentNeighbours(graph);
  const isEntry = new Uint8Array(n);
  for (const e of graph.entries) isEntry[e] = 1;
  const ctx: FeatureContext = {
    graph,
    ranking,
    index,
    mentions,
    neighbours,
    rankPct,
    isEntry,
    outlinks: contentOutlinks(graph),
    folders: graph.pages.map((p) => routeFolders(p.route)),
    rows: new TargetRows(graph, index, neighbours),
  };
  const pool = candidatePool({ graph, related, mentions, neighbours, minSimilarity: settings.minSimilarity });
  const linked = (s: number, t: number): boolean => hasContentLink(graph.forward, s, t);

  const eligible = graph.pages.filter((p) => !p.meta.exclude).map((p) => p.id);
  const fitted = fitLinkModel(trainingPairs(eligible, pool, linked), (s, t) => pairFeatures(ctx, s, t), input.fitMemo);
  const model = fitted.model;

  const scored: ScoredPair[] = [];
  for (const t of targets) {
    for (const s of pool(t)) {
      if (linked(s, t)) continue;
      const features = pairFeatures(ctx, s, t);
      const hit = mentions.bySource[s].get(t);
      scored.push({
        source: s,
        target: t,
        similarity: features[0],
        score: predictLogistic(model, features),
        scoreWithoutAnchor: predictLogistic(model, withoutNames(features)),
        anchors: hit === undefined ? [] : hit.anchors,
      });
    }
  }
  const perSource = settings.perSource === 0 ? Number.POSITIVE_INFINITY : settings.perSource;
  const floored = aboveFloor(pickUnderCaps(scored, perSource, settings.perTarget), settings.minScore, graph.entries.length > 0 ? ranking.depth : null);
  const chosen = bestOfStranded(fallbackAnchors(input, floored, cache), settings.minScore);
  const evidenceOf = (c: Chosen): Evidence => {
    const { source: s, target: t } = c.pair;
    const shared = sharedSegments(ctx.folders[s], ctx.folders[t]);
    // Computed again for the few pairs chosen rather than kept for every pair scored: at
    // 100,000 pages the vectors of every candidate pair were a large share of the stage's heap.
    const features = pairFeatures(ctx, s, t);
    return {
      features,
      contributions: contributions(model, [...features]),
      above: features.map((v, j) => v > model.means[j]),
      anchor: c.anchor,
      commonNeighbours: adamicAdar(neighbours, s, t).common,
      twoStep: twoStepPaths(graph, s, t),
      folder: shared === 0 ? '' : `/${ctx.folders[t].slice(0, shared).join('/')}/`,
    };
  };
  const choice = mentions.anchorChoice;
  const anchorChoice =
    choice === null
      ? null
      : { features: [...ANCHOR_FEATURES], intercept: choice.model.intercept, weights: [...choice.model.weights], means: [...choice.model.means], scales: [...choice.model.scales], linkedPairs: choice.groups, options: choice.options };
  return { chosen, model, modelReport: { ...fitted.report, anchorChoice }, mentions, evidenceOf, candidatesOf: pool };
}

/**
 * Under the least score, the share of it a stranded page's best suggestion still needs. On the
 * example site the one such suggestion ("predicted tide" in the glossary, for the orphan tide
 * guide) scores 0.047 against 0.05; on python-doc the stranded pages' best score 0.0003 and less
 * (generated include pages), links no author would write.
 */
export const STRANDED_FLOOR_SHARE = 0.2;

/**
 * The chosen pairs that reach the least score, and those of stranded targets that reach
 * {@link STRANDED_FLOOR_SHARE} of it, in their order ({@link bestOfStranded} then keeps one of
 * the latter per target). A stranded target is one no entry page reaches (an orphan page, or
 * one only such pages link to) with no suggestion that reaches the least score: a link is the
 * only fix for its finding, and a weak one a person can judge is more use than none. None on a
 * site without entry pages (`depth` null), where every page is unreachable.
 */
export function aboveFloor(chosen: readonly Chosen[], minScore: number, depth: ArrayLike<number> | null): Chosen[] {
  const reached = new Set<number>();
  for (const c of chosen) if (c.score >= minScore) reached.add(c.pair.target);
  return chosen.filter((c) => c.score >= minScore || (depth !== null && depth[c.pair.target] < 0 && !reached.has(c.pair.target) && c.score >= minScore * STRANDED_FLOOR_SHARE));
}

/** Of the pairs under the least score (see {@link aboveFloor}), the best with an anchor phrase per target (the first on a tie); the rest as they are. */
export function bestOfStranded(chosen: readonly Chosen[], minScore: number): Chosen[] {
  const best = new Map<number, Chosen>();
  for (const c of chosen) {
    if (c.score >= minScore || c.anchor === null) continue;
    const b = best.get(c.pair.target);
    if (b === undefined || c.score > b.score) best.set(c.pair.target, c);
  }
  return chosen.filter((c) => c.score >= minScore || best.get(c.pair.target) === c);
}

/**
 * Chosen pairs whose source mentions none of the target's names get the anchor search of
 * `anchor.ts` instead (part of the title, or a run of the target's key terms), clear of the
 * anchors already chosen in the same source; each source is tokenised once. Only chosen pairs
 * are searched: without a mention the pair's score is the same with or without such a phrase.
 */
function fallbackAnchors(input: SuggestInput, chosen: Chosen[], cache: ReturnType<typeof createStemCache>): Chosen[] {
  const { graph, index } = input;
  const factsOf = factsByPage(input);
  const need = chosen.map((_, i) => i).filter((i) => chosen[i].anchor === null);
  if (need.length === 0) return chosen;
  need.sort((a, b) => chosen[a].pair.source - chosen[b].pair.source || a - b);
  const taken = new Map<number, [number, number][]>();
  for (const c of chosen) {
    if (c.anchor === null) continue;
    const list = taken.get(c.pair.source) ?? [];
    list.push([c.anchor.offset, c.anchor.endOffset]);
    taken.set(c.pair.source, list);
  }
  const leaders = termLeaders(index, STRONG_LEADERS);
  const df = (stem: string): number => {
    let lo = 0;
    let hi = index.terms.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const t = index.terms[mid];
      if (t === stem) return index.df[mid];
      if (t < stem) lo = mid + 1;
      else hi = mid - 1;
    }
    return 0;
  };
  const names = new Map<number, TargetNames>();
  const namesOf = (t: number): TargetNames => {
    let v = names.get(t);
    if (v === undefined) {
      const page = graph.pages[t];
      const ids = t < index.docOffsets.length - 1 ? topTerms(index, t, KEY_TERMS) : [];
      const leads = (id: number): boolean => {
        for (let k = 0; k < STRONG_LEADERS; k++) if (leaders[id * STRONG_LEADERS + k] === t) return true;
        return false;
      };
      const keys = { all: ids.map((id) => index.terms[id]), strong: ids.filter((id) => leads(id)).map((id) => index.terms[id]) };
      v = targetNames(page.title, [page.route, ...page.meta.aliases], keys, cache, df);
      names.set(t, v);
    }
    return v;
  };
  const out = [...chosen];
  for (let k = 0; k < need.length; ) {
    const source = chosen[need[k]].pair.source;
    const tokens = prepareSource(factsOf(source)?.spans ?? [], cache, graph.pages[source].title);
    const avoid = taken.get(source) ?? [];
    for (; k < need.length && chosen[need[k]].pair.source === source; k++) {
      const i = need[k];
      const c = chosen[i];
      const anchors: AnchorMatch[] = findAnchors(tokens, namesOf(c.pair.target), avoid);
      if (anchors.length === 0) continue;
      avoid.push([anchors[0].offset, anchors[0].endOffset]);
      out[i] = { ...c, anchor: anchors[0], pair: { ...c.pair, anchors } };
    }
  }
  return out;
}
