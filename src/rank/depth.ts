/**
 * Click depth (DESIGN section 5): BFS hop count from the entry pages over the edges whose flags
 * share a bit with the mask (1 = content links, 3 = content and template links). -1 marks a
 * page no path reaches. The queue is one Int32Array; each node is queued once.
 */
import type { Csr } from '../types.js';

/** An edge added on top of the CSR (a proposed content link): always followed. */
export interface ExtraLink {
  readonly from: number;
  readonly to: number;
}

/**
 * Depth of every node from `entries` (depth 0) over `forward` edges with `flags & flagMask`,
 * plus `extraEdges`. Entries outside the graph are ignored.
 */
export function clickDepth(forward: Csr, entries: readonly number[], flagMask: number, extraEdges?: readonly ExtraLink[]): Int32Array {
  const n = forward.offsets.length - 1;
  const depth = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  let head = 0;
  let tail = 0;
  for (const e of entries) {
    if (e >= 0 && e < n && depth[e] === -1) {
      depth[e] = 0;
      queue[tail++] = e;
    }
  }
  // Extra edges as linked lists per source (only when there are any).
  let extraHead: Int32Array | null = null;
  let extraNext: Int32Array | null = null;
  let extraTo: Int32Array | null = null;
  if (extraEdges !== undefined && extraEdges.length > 0) {
    extraHead = new Int32Array(n).fill(-1);
    extraNext = new Int32Array(extraEdges.length);
    extraTo = new Int32Array(extraEdges.length);
    for (let k = 0; k < extraEdges.length; k++) {
      const { from, to } = extraEdges[k];
      if (!(from >= 0 && from < n && to >= 0 && to < n)) continue;
      extraTo[k] = to;
      extraNext[k] = extraHead[from];
      extraHead[from] = k;
    }
  }
  const { offsets, targets, flags } = forward;
  while (head < tail) {
    const u = queue[head++];
    const d = depth[u] + 1;
    const end = offsets[u + 1];
    for (let e = offsets[u]; e < end; e++) {
      if ((flags[e] & flagMask) === 0) continue;
      const v = targets[e];
      if (depth[v] === -1) {
        depth[v] = d;
        queue[tail++] = v;
      }
    }
    if (extraHead !== null) {
      for (let k = extraHead[u]; k >= 0; k = extraNext![k]) {
        const v = extraTo![k];
        if (depth[v] === -1) {
          depth[v] = d;
          queue[tail++] = v;
        }
      }
    }
  }
  return depth;
}
