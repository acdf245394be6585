/**
 * Structural facts about pages shared by the rules and the report's counts, so that a finding
 * and the statistic a gate limit reads can never disagree on what an orphan or a dead end is.
 */
import type { ResolvedOptions } from '../options.js';
import type { Csr, Ranking, SiteGraph } from '../types.js';
/** Path of the navigation file as the report names it (relative posix path, no leading `./`). */
export declare function navigationFile(options: Pick<ResolvedOptions, 'navigation'>): string;
/** Ids of the entry pages, as a set. */
export declare function entrySet(graph: SiteGraph): ReadonlySet<number>;
/** Pages that take part in findings: not excluded by `linkweave.exclude`. */
export declare function isChecked(graph: SiteGraph, page: number): boolean;
/** Number of distinct pages `page` links to with at least one content link. */
export declare function contentOutlinks(forward: Csr, page: number): number;
/**
 * Orphan page: no inlinks from any other page (template links count unless
 * `countTemplateLinks` is false). Entry pages are never orphans.
 */
export declare function isOrphan(graph: SiteGraph, ranking: Ranking, entries: ReadonlySet<number>, page: number, countTemplateLinks?: boolean): boolean;
/**
 * Dead end: no content outlinks to other pages (template links count only when
 * `countTemplateLinks` is true). A site of one page has no dead ends: there is nowhere to link to.
 */
export declare function isDeadEnd(graph: SiteGraph, ranking: Ranking, page: number, countTemplateLinks?: boolean): boolean;
/** Unreachable: no path of links from any entry page. */
export declare function isUnreachable(ranking: Ranking, page: number): boolean;
/** Code-unit order, the same on every machine (unlike `localeCompare`). */
export declare function compareText(a: string, b: string): number;
