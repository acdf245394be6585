/**
 * The site's names for its pages, and where the prose mentions them (the candidate source and
 * the name evidence of the link model, after Milne and Witten, "Learning to link with
 * Wikipedia", CIKM 2008, and Gerlach et al., CIKM 2021: a dictionary of names built from the
 * site's own links, matched on the longest n-grams of the text).
 *
 * A page's names: its title, its aliases (the words of the last segment of its route and of its
 * frontmatter aliases), the labels its template links carry (a sidebar's words for it), and the
 * anchor texts of the content links other pages already point at it with. Names are compared
 * on Porter stems (the text stage's tokenizer), so "Caching tiles" matches "cached tile".
 *
 * Each distinct name (a phrase) counts its occurrences over the site: in prose, and as the whole
 * text of a content link (to which page). From those come a phrase's link probability (the
 * share of its occurrences that are links) and its commonness for a page (the share of its links
 * that point there). A phrase that names more than {@link MAX_PAGES_PER_NAME} pages is too
 * ambiguous to be a name and is left out.
 *
 * Built in one pass over every page's prose through a trie of the phrases, so the cost is the
 * number of words times the length of the longest match, never pages times names.
 */
import type { PageFacts, SiteGraph } from '../types.js';
import type { StemCache } from '../text/tokenize.js';
import type { AnchorMatch } from './anchor.js';
/** Where a name comes from. */
export type NameKind = 'title' | 'alias' | 'label' | 'anchor-text';
/** A phrase that names more pages than this is left out of the dictionary. */
export declare const MAX_PAGES_PER_NAME = 8;
/** Longest name, in kept words. */
export declare const MAX_NAME_WORDS = 8;
/** Distinct phrases kept per (source, target) pair as anchor options (each at its first mention). */
export declare const MENTIONS_KEPT = 6;
/** One page's claim on a phrase. */
export interface NameRef {
    readonly target: number;
    readonly kind: NameKind;
    /** For anchor texts: source page -> number of its content links to the target with this text. */
    readonly users: Map<number, number> | null;
}
/** A distinct name, with its counts over the site. */
export interface Phrase {
    readonly stems: readonly string[];
    readonly names: NameRef[];
    /** Occurrences in prose. */
    prose: number;
    /** Content links whose whole text is this phrase. */
    linked: number;
    /** Of those, per target page. */
    readonly linkedTo: Map<number, number>;
}
/** Where a source mentions one target. */
export interface MentionHit {
    /** Mentions of any of the target's names (sub-phrases of a longer match count too). */
    count: number;
    /** Distinct phrases matched. */
    readonly phrases: number[];
    /**
     * Anchor options: the first mention of each distinct phrase (at most {@link MENTIONS_KEPT},
     * not overlapping), best first once `rankAnchors` has run.
     */
    readonly anchors: AnchorMatch[];
    /** The phrase of each anchor option. */
    readonly anchorPhrases: number[];
}
/** The dictionary and the mentions found. */
export interface MentionIndex {
    readonly phrases: readonly Phrase[];
    /** Per source page id: target -> the source's mentions of it. */
    readonly bySource: readonly Map<number, MentionHit>[];
    /** Per source page id: the phrases found in the texts of its content links to pages. */
    readonly linkMatches: readonly (readonly LinkTextMatch[])[];
}
/** A phrase found in the text of a content link. */
export interface LinkTextMatch {
    /** The page the link points to. */
    readonly target: number;
    readonly phrase: number;
    /** The phrase is the link's whole text. */
    readonly exact: boolean;
}
/**
 * Build the name dictionary and find every mention in the prose of every page.
 * @param factsOf facts by page id (spans give the prose)
 */
export declare function buildMentionIndex(graph: SiteGraph, factsOf: (page: number) => PageFacts | undefined, cache: StemCache): MentionIndex;
/**
 * Whether a name of `target` in `phrase` stands for the pair (source, target) as if the pair's
 * own links were absent: anchor texts count only when another page uses them.
 */
export declare function nameKindsFor(phrase: Phrase, source: number, target: number): NameKind[];
