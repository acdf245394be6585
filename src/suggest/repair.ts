/**
 * The depth-repair plan (DESIGN section 7): a small set of the suggestions that together bring
 * as many pages as they can within `maxDepth`, chosen greedily, as for set cover: each round
 * takes the suggestion that fixes the most remaining depth findings (pages deeper than
 * `maxDepth` or unreachable, not excluded) given the links already taken, until none fixes
 * any. Gains are evaluated lazily (a stored gain is recomputed when it reaches the top, at once
 * for suggestions whose source page got closer to the entry pages, and for all before stopping);
 * ties go to the higher score, then the smaller id.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Ranking, SiteGraph } from '../types.js';
import { DepthState, depthState } from './impact.js';
import type { RepairPlan } from './types.js';

/** What the plan needs of a suggestion. */
export interface PlanCandidate {
  readonly id: string;
  readonly source: number;
  readonly target: number;
  readonly score: number;
}

/** Greedy depth-repair plan over the given suggestions. */
export function repairPlan(graph: SiteGraph, ranking: Ranking, options: ResolvedOptions, candidates: readonly PlanCandidate[]): RepairPlan {
  const { maxDepth } = options;
  const state: DepthState = depthState(graph, ranking, options);
  const counts = (p: number): boolean => !graph.pages[p].meta.exclude;
  const isBad = (p: number): boolean => counts(p) && (state.depth[p] < 0 || state.depth[p] > maxDepth);
  let bad = 0;
  for (let p = 0; p < graph.pages.length; p++) if (isBad(p)) bad++;
  const tooDeepBefore = bad;

  const bySource = new Map<number, number[]>();
  candidates.forEach((c, i) => {
    const list = bySource.get(c.source);
    if (list === undefined) bySource.set(c.source, [i]);
    else list.push(i);
  });
  const version = new Int32Array(candidates.length);
  const chosen = new Uint8Array(candidates.length);
  type Entry = { i: number; gain: number; version: number };
  const better = (a: Entry, b: Entry): boolean => {
    if (a.gain !== b.gain) return a.gain > b.gain;
    const ca = candidates[a.i];
    const cb = candidates[b.i];
    if (ca.score !== cb.score) return ca.score > cb.score;
    return ca.id < cb.id;
  };
  const heap: Entry[] = [];
  const push = (e: Entry): void => {
    heap.push(e);
    let i = heap.length - 1;
    while (i > 0 && better(heap[i], heap[(i - 1) >> 1])) {
      [heap[i], heap[(i - 1) >> 1]] = [heap[(i - 1) >> 1], heap[i]];
      i = (i - 1) >> 1;
    }
  };
  const pop = (): Entry | undefined => {
    const top = heap[0];
    const last = heap.pop();
    if (heap.length > 0 && last !== undefined) {
      heap[0] = last;
      let i = 0;
      for (;;) {
        let b = i;
        for (const c of [2 * i + 1, 2 * i + 2]) if (c < heap.length && better(heap[c], heap[b])) b = c;
        if (b === i) break;
        [heap[i], heap[b]] = [heap[b], heap[i]];
        i = b;
      }
    }
    return top;
  };
  const evaluate = (i: number): void => {
    const c = candidates[i];
    const gain = state.gain(c.source, c.target, maxDepth, counts);
    version[i] += 1;
    if (gain > 0) push({ i, gain, version: version[i] });
  };
  candidates.forEach((_, i) => evaluate(i));

  const suggestionIds: string[] = [];
  for (let e = pop(); ; e = pop()) {
    if (e === undefined) {
      // A gain can also grow when a chosen link opens a shorter path below a candidate's target;
      // so before stopping, look at every candidate once more.
      candidates.forEach((_, i) => {
        if (chosen[i] === 0) evaluate(i);
      });
      e = pop();
      if (e === undefined) break;
    }
    if (chosen[e.i] === 1 || e.version !== version[e.i]) continue;
    const c = candidates[e.i];
    const gain = state.gain(c.source, c.target, maxDepth, counts);
    if (gain <= 0) continue;
    if (gain < e.gain) {
      push({ i: e.i, gain, version: e.version });
      continue;
    }
    chosen[e.i] = 1;
    suggestionIds.push(c.id);
    for (const p of state.add(c.source, c.target)) {
      for (const i of bySource.get(p) ?? []) if (chosen[i] === 0) evaluate(i);
    }
    bad -= gain; // `gain` counted exactly the pages this link brings within maxDepth
  }
  return { maxDepth, tooDeepBefore, tooDeepAfter: bad, suggestionIds };
}
