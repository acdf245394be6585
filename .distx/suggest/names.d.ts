import type { StemCache } from '../text/tokenize.js';
/** A name of the target (its title or an alias) as stems, with the stems a partial match must include. */
export interface TargetName {
    readonly stems: readonly string[];
    /** The rarest stems of the name (smallest document frequency). */
    readonly rarest: ReadonlySet<string>;
}
/** The words of a target page an anchor may match. */
export interface TargetNames {
    readonly title: TargetName;
    /** Each alias (route segment words); none equal to the title. */
    readonly aliases: readonly TargetName[];
    /** Stems of the target's key terms. */
    readonly keyTerms: ReadonlySet<string>;
    /** Key terms for which the target is among the pages they weigh most in (a run needs one). */
    readonly strongTerms: ReadonlySet<string>;
    /** Stems of the title and the aliases (a run of key terms needs one). */
    readonly nameWords: ReadonlySet<string>;
}
/** A target's key terms (heaviest first) and the strong ones among them. */
export interface KeyTerms {
    readonly all: readonly string[];
    readonly strong: readonly string[];
}
/** Stems of the words of the last segment of a route or alias (`/guide/cache-server/` -> cach, server). */
export declare function routeWords(route: string, cache: StemCache): string[];
/**
 * The names of a target page.
 * @param keyTerms the target's key terms; in a plain list every term counts as strong
 * @param df document frequency of a stem (0 when the index does not know it)
 */
export declare function targetNames(title: string, routes: readonly string[], keyTerms: readonly string[] | KeyTerms, cache: StemCache, df?: (stem: string) => number): TargetNames;
