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
export declare function clickDepth(forward: Csr, entries: readonly number[], flagMask: number, extraEdges?: readonly ExtraLink[]): Int32Array;
