/**
 * Types of the graph stage's own inputs and helpers (the shared ones are in `src/types.ts`).
 */
import type { RawLink, PageFacts } from '../types.js';
/**
 * One line of a redirects file: `from` still resolves, to the page `to` names. The same shape
 * as the parse stage's `Redirect` (declared here so the graph stage does not import parse).
 */
export interface GraphRedirect {
    readonly from: string;
    readonly to: string;
    /** 1-based line in the redirects file. */
    readonly line: number;
}
/** What `buildGraph` takes. */
export interface GraphInput {
    /** Facts of every parsed source file, in any order; the graph sorts pages by route. */
    readonly pages: readonly PageFacts[];
    /** Other files under the content root (relative posix paths), from collect. */
    readonly assets: readonly string[];
    /** The navigation file's links (template links on every page), or null. */
    readonly navigation: {
        readonly file: string;
        readonly links: readonly RawLink[];
    } | null;
    readonly redirects: readonly GraphRedirect[];
}
/** Where a redirect chain ends when it reaches no page. */
export type RedirectEnd = {
    readonly kind: 'external';
    readonly url: string;
} | {
    readonly kind: 'dead';
    readonly route: string;
};
/** An edge list before it becomes CSR: parallel arrays, `length` entries used. */
export interface EdgeList {
    from: Int32Array;
    to: Int32Array;
    weight: Float32Array;
    /** 1 = content, 2 = template. */
    flags: Uint8Array;
    length: number;
}
