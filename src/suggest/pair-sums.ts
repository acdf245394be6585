/**
 * The three sums of a pair's features that read two rows each (TF-IDF cosine similarity,
 * Adamic-Adar, two-step paths), for many pairs in a row that share their target: the suggest
 * stage scores a target's candidates one after the other (about 220,000 pairs for 5,000 targets
 * on a generated 10,000-page site), and so does the fit's training sample (sorted by target).
 *
 * Why by hand: the pairwise forms (`cosine`, `adamicAdar`, `twoStepPaths`) merge two sorted rows,
 * a branch per entry of both. Here the target's rows are spread once into dense arrays stamped
 * with the target, and each pair walks only the source's row. Each sum still adds its terms in
 * the same order (the source's row, ascending), so the values are those of the pairwise forms to
 * the bit; `test/suggest/pair-sums.test.ts` compares them on every candidate pair of a site.
 */
import { EDGE_CONTENT } from '../graph/csr.js';
import type { SiteGraph, TermIndex } from '../types.js';
import type { Neighbours } from './proximity.js';

/** The sums of one pair. */
export interface PairSums {
  /** TF-IDF cosine similarity (0 when either page has no row in the index). */
  similarity: number;
  /** Adamic-Adar over the undirected content neighbours. */
  adamicAdar: number;
  /** Pages x with content links source -> x -> target. */
  twoStep: number;
}

/** Pair sums with the target's rows kept between calls. */
export class TargetRows {
  private readonly index: TermIndex;
  private readonly rows: number;
  private readonly nb: Neighbours;
  private readonly graph: SiteGraph;
  /** The target's weight per term; valid where `termStamp` holds the current stamp. */
  private readonly weight: Float64Array;
  private readonly termStamp: Int32Array;
  /** Stamp of the target's neighbours, and of its content in-pages. */
  private readonly nbStamp: Int32Array;
  private readonly inStamp: Int32Array;
  private target = -1;
  private stamp = 0;
  private readonly out: PairSums = { similarity: 0, adamicAdar: 0, twoStep: 0 };

  constructor(graph: SiteGraph, index: TermIndex, nb: Neighbours) {
    const n = graph.pages.length;
    this.graph = graph;
    this.index = index;
    this.rows = index.docOffsets.length - 1;
    this.nb = nb;
    this.weight = new Float64Array(index.terms.length);
    this.termStamp = new Int32Array(index.terms.length);
    this.nbStamp = new Int32Array(n);
    this.inStamp = new Int32Array(n);
  }

  /** The sums of s -> t. The returned object is reused by the next call. */
  of(s: number, t: number): PairSums {
    if (t !== this.target) this.load(t);
    const out = this.out;
    out.similarity = s < this.rows && t < this.rows ? this.cosine(s) : 0;
    out.adamicAdar = this.adamicAdar(s, t);
    out.twoStep = this.twoStep(s, t);
    return out;
  }

  private load(t: number): void {
    this.target = t;
    const stamp = ++this.stamp;
    const { index, nb } = this;
    if (t < this.rows) {
      for (let e = index.docOffsets[t]; e < index.docOffsets[t + 1]; e++) {
        const term = index.docTerms[e];
        this.termStamp[term] = stamp;
        this.weight[term] = index.docWeights[e];
      }
    }
    for (let e = nb.offsets[t]; e < nb.offsets[t + 1]; e++) this.nbStamp[nb.targets[e]] = stamp;
    const r = this.graph.reverse;
    for (let e = r.offsets[t]; e < r.offsets[t + 1]; e++) if ((r.flags[e] & EDGE_CONTENT) !== 0) this.inStamp[r.targets[e]] = stamp;
  }

  /** `cosine(index, s, t)`: the products over the terms both rows hold, in term order. */
  private cosine(s: number): number {
    const { index, stamp } = this;
    let sum = 0;
    for (let e = index.docOffsets[s]; e < index.docOffsets[s + 1]; e++) {
      const term = index.docTerms[e];
      if (this.termStamp[term] === stamp) sum += index.docWeights[e] * this.weight[term];
    }
    return sum;
  }

  /** `adamicAdar(nb, s, t).adamicAdar`: over s's neighbours that are t's, ascending. */
  private adamicAdar(s: number, t: number): number {
    const { nb, stamp } = this;
    let aa = 0;
    for (let e = nb.offsets[s]; e < nb.offsets[s + 1]; e++) {
      const z = nb.targets[e];
      if (this.nbStamp[z] === stamp && z !== s && z !== t) aa += 1 / Math.log(nb.offsets[z + 1] - nb.offsets[z]);
    }
    return aa;
  }

  /** `twoStepPaths(graph, s, t)`: s's content out-pages that link to t in their content. */
  private twoStep(s: number, t: number): number {
    const f = this.graph.forward;
    const stamp = this.stamp;
    let count = 0;
    for (let e = f.offsets[s]; e < f.offsets[s + 1]; e++) {
      const x = f.targets[e];
      if ((f.flags[e] & EDGE_CONTENT) !== 0 && this.inStamp[x] === stamp && x !== s && x !== t) count++;
    }
    return count;
  }
}
