/**
 * The held-out sample of a backtest: a seeded share of the site's content links between pages,
 * removed from the in-memory page facts (never from the files) so the suggestion stage can try
 * to propose them again.
 *
 * - Unit: a (source, target) pair of pages. Holding a pair out removes every content link of
 *   the source to the target (a second link to the same page would otherwise keep the pair
 *   linked, and the suggestion stage never proposes a pair that is already linked).
 * - Eligible: pairs of content links (after template detection) between two different pages,
 *   neither excluded by `linkweave.exclude`. Template links (HTML `nav`/`header`/`footer`/
 *   `aside`, links repeated on `templateShare` of the pages, the navigation file) are never
 *   held out.
 * - Realistic remainder: a page keeps at least one content inlink; pairs are taken in a seeded
 *   random order (mulberry32, Fisher-Yates) and a pair whose target would lose its last content
 *   inlink is passed over.
 * - Size: round(share x eligible pairs), at least 1 when any pair is eligible; fewer when the
 *   inlink rule leaves fewer.
 * - The words: by default they go with the link, out of the page's text (the term index is
 *   rebuilt from what remains) and, as link text never is prose, nowhere an anchor could be
 *   proposed: as if the author had never written the link. With `keepLinkText` they stay in the
 *   page's text and become a prose span at their place: as if the author had written the
 *   words without a link (`unlink.ts`).
 * - The held-out set keeps each link's text and, where it can be located, its offsets.
 */
import type { PageFacts, ResolvedLink, SiteGraph } from '../types.js';
import type { HeldOutPair } from './types.js';
/** A (source, target) pair of pages with its content links. */
export interface ContentPair {
    readonly source: number;
    readonly target: number;
    readonly links: readonly ResolvedLink[];
}
/** The pairs of content links between different pages, sorted by source then target. */
export declare function contentPairs(graph: SiteGraph): ContentPair[];
/** Pairs that may be held out: neither page excluded. */
export declare function eligiblePairs(graph: SiteGraph, pairs: readonly ContentPair[]): ContentPair[];
/** What `holdOut` needs. */
export interface HoldoutInput {
    readonly graph: SiteGraph;
    /** The facts given to `buildGraph` (`graph.pages[i].factsIndex` indexes them). */
    readonly facts: readonly PageFacts[];
    /** Decoded text of a source file by path, to turn removed links into prose; undefined if unknown. */
    readonly sourceText: (file: string) => string | undefined;
    /** `contentPairs(graph)`, when the caller has it already. */
    readonly pairs?: readonly ContentPair[];
    /** Turn the text of each removed link into a prose span (see `BacktestSettings.keepLinkText`). @default false */
    readonly keepLinkText?: boolean;
}
/** The facts with the held-out links removed, and what was held out. */
export interface Holdout {
    /** Same length and order as the input facts; unchanged pages are the same objects. */
    readonly facts: PageFacts[];
    /** Sorted by source, then target. */
    readonly heldOut: HeldOutPair[];
}
/**
 * Hold out a seeded share of the content-link pairs.
 * @param share in (0, 1]
 * @param seed any safe integer
 */
export declare function holdOut(input: HoldoutInput, share: number, seed: number): Holdout;
/** Remove every content link of the given pairs from the facts (pure; the input is not changed). */
export declare function removePairs(input: HoldoutInput, pairs: readonly ContentPair[]): Holdout;
