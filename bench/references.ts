/**
 * References measured in the same run as the pipeline, so that the bench reports ratios
 * against something nobody here wrote (or against the machine itself):
 *
 * (a) bare parse: the same files through `unified().use(remarkParse).parse(text)` and nothing else;
 * (b) graphology-metrics `pagerank` on the same weighted graph, to the same stopping rule;
 * (c) the machine's sequential-read rate, and the bytes our PageRank reads per iteration;
 * (d) brute-force all-pairs cosine top-k over the same term index (see brute-force.ts).
 */
import { createRequire } from 'node:module';
import { DirectedGraph } from 'graphology';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import type { Built } from './lib.js';
import type { SiteGraph } from '../src/types.js';

// graphology-metrics is CommonJS (`module.exports = pagerank`) with an ESM-style declaration file:
// load it with require so the value and its type agree.
type GraphologyPagerank = typeof import('graphology-metrics/centrality/pagerank.js').default;
const graphologyPagerank = createRequire(import.meta.url)('graphology-metrics/centrality/pagerank.js') as GraphologyPagerank;

/** Wall and CPU milliseconds of one measured span (CPU: the whole process, all threads). */
export interface Span {
  readonly ms: number;
  readonly cpuMs: number;
}

/** Start measuring; `stop()` gives the wall and CPU time since. */
export function startClock(): { stop(): Span } {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  return {
    stop(): Span {
      const ms = performance.now() - t0;
      const c = process.cpuUsage(c0);
      return { ms, cpuMs: (c.user + c.system) / 1000 };
    },
  };
}

/** Milliseconds of `fn`, timed with the high-resolution clock. */
export function timeMs(fn: () => void): number {
  const t = performance.now();
  fn();
  return performance.now() - t;
}

/** (a) Time to parse every text with remark-parse alone (no plugins, no tree walk). */
export function bareParse(texts: readonly string[]): Span {
  const processor = unified().use(remarkParse);
  let nodes = 0;
  const clock = startClock();
  for (const text of texts) nodes += processor.parse(text).children.length;
  const span = clock.stop();
  if (nodes === 0 && texts.length > 0) throw new Error('bench: bare parse produced no nodes');
  return span;
}

/** The forward edges of a site graph as plain arrays (the common input of both PageRanks). */
export interface EdgeArrays {
  readonly n: number;
  readonly from: Int32Array;
  readonly to: Int32Array;
  readonly weight: Float32Array;
}

/** Edges of the graph's forward CSR. */
export function edgesOf(graph: SiteGraph): EdgeArrays {
  const { offsets, targets, weights } = graph.forward;
  const n = graph.pages.length;
  const m = targets.length;
  const from = new Int32Array(m);
  for (let u = 0; u < n; u++) from.fill(u, offsets[u]!, offsets[u + 1]!);
  return { n, from, to: targets.slice(), weight: weights.slice() };
}

/** Outcome of the PageRank comparison. */
export interface PagerankComparison {
  readonly nodes: number;
  readonly edges: number;
  /** Ours: CSR construction from the edge arrays plus power iteration. */
  readonly ours: Span;
  /** Ours: power iteration alone (best of 3, the run least disturbed by other work), on the CSR built above. */
  readonly oursIterateMs: number;
  readonly oursIterations: number;
  readonly oursConverged: boolean;
  /** graphology: graph construction from the same edge arrays plus its `pagerank`. */
  readonly graphology: Span;
  readonly graphologyBuildMs: number;
  /** graphology's message when it did not converge (it throws), else null. */
  readonly graphologyError: string | null;
  /** Largest |ours - graphology| over the nodes. */
  readonly maxAbsDiff: number;
  /** Bytes of reverse offsets + sources + weights + two score vectors. */
  readonly bytesPerIteration: number;
}

/**
 * (b) Our PageRank against graphology-metrics' on the same weighted edges.
 *
 * Same model on both sides: damping 0.85, uniform teleport, dangling pages' rank spread
 * uniformly (graphology adds `dangleSum / N` to every node), edge weights normalised by the
 * source's out-weight sum (graphology divides each weight by the weighted out-degree). Same
 * stopping rule: graphology stops when the L1 change < `N * tolerance`, so its tolerance is
 * set to `1e-10 / N` for the L1 change < 1e-10 that ours uses; both at most 200 iterations.
 */
export function comparePagerank(lib: Pick<Built, 'graph' | 'rank'>, edges: EdgeArrays, damping: number, tolerance: number, maxIterations: number): PagerankComparison {
  const { n, from, to, weight } = edges;
  const m = from.length;
  const opts = { damping, tolerance, maxIterations };

  const gc = (globalThis as { gc?: () => void }).gc;
  gc?.();
  const oursClock = startClock();
  const list = lib.graph.createEdgeList(m);
  for (let e = 0; e < m; e++) lib.graph.pushEdge(list, from[e]!, to[e]!, weight[e]!, 1);
  const built = lib.graph.buildCsr(list, n);
  const result = lib.rank.pagerank(built.forward, built.reverse, n, opts);
  const ours = oursClock.stop();
  const iterateRuns: number[] = [];
  for (let r = 0; r < 3; r++) iterateRuns.push(timeMs(() => lib.rank.pagerank(built.forward, built.reverse, n, opts)));
  iterateRuns.sort((a, b) => a - b);

  let theirs: Record<string, number> | null = null;
  let graphologyError: string | null = null;
  gc?.();
  const t1 = performance.now();
  const theirClock = startClock();
  const g = new DirectedGraph();
  for (let i = 0; i < n; i++) g.addNode(i);
  for (let e = 0; e < m; e++) g.addDirectedEdge(from[e]!, to[e]!, { weight: weight[e]! });
  const graphologyBuildMs = performance.now() - t1;
  try {
    theirs = graphologyPagerank(g, { alpha: damping, tolerance: tolerance / n, maxIterations, getEdgeWeight: 'weight' });
  } catch (error) {
    graphologyError = (error as Error).message;
  }
  const graphology = theirClock.stop();

  let maxAbsDiff = Number.NaN;
  if (theirs !== null) {
    maxAbsDiff = 0;
    for (let i = 0; i < n; i++) maxAbsDiff = Math.max(maxAbsDiff, Math.abs(result.scores[i]! - theirs[String(i)]!));
  }
  const reverseEdges = built.reverse.targets.length;
  return {
    nodes: n,
    edges: m,
    ours,
    oursIterateMs: iterateRuns[0]!,
    oursIterations: result.iterations,
    oursConverged: result.converged,
    graphology,
    graphologyBuildMs,
    graphologyError,
    maxAbsDiff,
    bytesPerIteration: 4 * (n + 1) + 4 * reverseEdges + 4 * reverseEdges + 2 * 8 * n,
  };
}

/** Sequential-read rate of this machine. */
export interface Bandwidth {
  /** Best bytes per second summing a large Float64Array. */
  readonly float64: number;
  /** Best bytes per second summing a large Int32Array. */
  readonly int32: number;
}

/**
 * (c) Sequential-read rate: sum a 256 MiB array (larger than any cache) several times with
 * four independent accumulators (so the adds do not limit the loop), keep the best pass.
 */
export function measureBandwidth(passes = 5): Bandwidth {
  const bytes = 256 * 1024 * 1024;
  const f = new Float64Array(bytes / 8).fill(1.5);
  let best = Infinity;
  let check = 0;
  for (let p = 0; p < passes; p++) {
    best = Math.min(best, timeMs(() => {
      let a = 0, b = 0, c = 0, d = 0;
      for (let i = 0; i < f.length; i += 4) {
        a += f[i]!;
        b += f[i + 1]!;
        c += f[i + 2]!;
        d += f[i + 3]!;
      }
      check += a + b + c + d;
    }));
  }
  const float64 = bytes / (best / 1000);
  const k = new Int32Array(bytes / 4).fill(3);
  best = Infinity;
  for (let p = 0; p < passes; p++) {
    best = Math.min(best, timeMs(() => {
      let a = 0, b = 0, c = 0, d = 0;
      for (let i = 0; i < k.length; i += 4) {
        a = (a + k[i]!) | 0;
        b = (b + k[i + 1]!) | 0;
        c = (c + k[i + 2]!) | 0;
        d = (d + k[i + 3]!) | 0;
      }
      check += a + b + c + d;
    }));
  }
  if (!Number.isFinite(check)) throw new Error('bench: bandwidth check sum is not finite');
  return { float64, int32: bytes / (best / 1000) };
}
