/**
 * The backtest's metrics, per method and run. The ground truth is the held-out pairs: for a
 * target page t, H(t) is the set of pages whose links to t were held out. A method gives, for
 * each target, a ranked list L(t) of proposed source pages, at most {@link LIST_LENGTH} long.
 * Only targets with at least one held-out inlink are scored (T, the scored targets), and every
 * metric is the mean over T (macro average: each target page counts once, however many
 * held-out inlinks it has):
 *
 * - hits@k(t)      = |H(t) ∩ first k of L(t)|
 * - recall@k       = mean over T of hits@k(t) / |H(t)|
 * - precision@k    = mean over T of hits@k(t) / k   (k, not |L(t)|: a short list is not rewarded)
 * - MRR            = mean over T of 1 / (rank of the first page of H(t) in L(t)), 0 when none
 *                    is in L(t) (so it is MRR at 10)
 * - anchor overlap = among recovered pairs (s in H(t) and in L(t)), the share whose proposed
 *                    anchor shares at least one word stem (the text stage's tokenizer: lower
 *                    case, stop words out, Porter stems) with the text of one of the pair's
 *                    held-out links; a suggestion without an anchor does not overlap
 * - anchor in place = among recovered pairs, the share whose anchor's offsets in the source
 *                    overlap the place of one of the pair's held-out link texts (only when the
 *                    link texts are kept as prose; otherwise that place cannot be proposed)
 * - line match     = among recovered pairs, the share whose anchor is on the line of one of the
 *                    pair's held-out links, or on the line where that link's text starts (an HTML
 *                    link's text may follow its tag on the next line); a pair without an anchor
 *                    does not match
 */
import { tokenize } from '../text/index.js';
import type { StemCache } from '../text/index.js';
import type { HeldOutPair, MethodId, MethodScores } from './types.js';

/** The cut-offs reported. */
export const K_VALUES = [1, 5, 10] as const;
/** Length of the ranked lists compared (the largest k). */
export const LIST_LENGTH = 10;

/** One proposed source of a ranked list. */
export interface RankedSource {
  readonly source: number;
  /** The proposed anchor phrase, or null (baselines, or a suggestion without a phrase). */
  readonly anchor: string | null;
  /** UTF-16 offsets of the anchor in the source file, -1 when there is none. */
  readonly offset: number;
  readonly endOffset: number;
  /** 1-based line of the anchor, -1 when there is none. */
  readonly line: number;
}

/** Held-out pairs grouped by target page, targets ascending. */
export function heldOutByTarget(heldOut: readonly HeldOutPair[]): Map<number, Map<number, HeldOutPair>> {
  const byTarget = new Map<number, Map<number, HeldOutPair>>();
  for (const p of [...heldOut].sort((a, b) => a.target - b.target || a.source - b.source)) {
    const m = byTarget.get(p.target) ?? new Map<number, HeldOutPair>();
    m.set(p.source, p);
    byTarget.set(p.target, m);
  }
  return byTarget;
}

/** Which anchor metrics a method gets. */
export interface AnchorScoring {
  /** The method proposes anchors: compute `anchorOverlap` (else null). */
  readonly overlap: boolean;
  /** The held-out link texts were kept as prose: compute `anchorInPlace` (else null). */
  readonly inPlace: boolean;
}

/** Score one method's ranked lists against the held-out pairs. */
export function scoreMethod(
  method: MethodId,
  lists: ReadonlyMap<number, readonly RankedSource[]>,
  byTarget: ReadonlyMap<number, ReadonlyMap<number, HeldOutPair>>,
  anchors: AnchorScoring,
  cache: StemCache,
): MethodScores {
  const withAnchors = anchors.overlap;
  const recall = [0, 0, 0];
  const precision = [0, 0, 0];
  let rr = 0;
  let recovered = 0;
  let overlap = 0;
  let inPlace = 0;
  let onLine = 0;
  for (const [target, truth] of byTarget) {
    const list = (lists.get(target) ?? []).slice(0, LIST_LENGTH);
    let first = -1;
    K_VALUES.forEach((k, ki) => {
      let hits = 0;
      for (let r = 0; r < Math.min(k, list.length); r++) if (truth.has(list[r].source)) hits++;
      recall[ki] += hits / truth.size;
      precision[ki] += hits / k;
    });
    list.forEach((item, r) => {
      const pair = truth.get(item.source);
      if (pair === undefined) return;
      if (first < 0) first = r;
      recovered++;
      if (!withAnchors || item.anchor === null) return;
      if (item.line >= 0 && pair.links.some((l) => l.textLine === item.line || l.line === item.line)) onLine++;
      const stems = new Set(tokenize(item.anchor, cache));
      if (pair.links.some((l) => tokenize(l.text, cache).some((s) => stems.has(s)))) overlap++;
      if (item.offset >= 0 && pair.links.some((l) => l.offset >= 0 && item.offset < l.endOffset && l.offset < item.endOffset)) inPlace++;
    });
    if (first >= 0) rr += 1 / (first + 1);
  }
  const t = byTarget.size;
  const mean = (x: number): number => (t === 0 ? 0 : x / t);
  const share = (x: number, on: boolean): number | null => (!on || recovered === 0 ? null : x / recovered);
  return {
    method,
    recall: [mean(recall[0]), mean(recall[1]), mean(recall[2])],
    precision: [mean(precision[0]), mean(precision[1]), mean(precision[2])],
    mrr: mean(rr),
    recovered,
    anchorOverlap: share(overlap, withAnchors),
    anchorInPlace: share(inPlace, withAnchors && anchors.inPlace),
    lineMatch: share(onLine, withAnchors),
  };
}

/** Mean and sample standard deviation (n - 1; 0 for one value) of the non-null values; null when there are none. */
export function spread(values: readonly (number | null)[]): { mean: number | null; sd: number | null } {
  const xs = values.filter((v): v is number => v !== null);
  if (xs.length === 0) return { mean: null, sd: null };
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  if (xs.length === 1) return { mean, sd: 0 };
  const ss = xs.reduce((a, b) => a + (b - mean) * (b - mean), 0);
  return { mean, sd: Math.sqrt(ss / (xs.length - 1)) };
}
