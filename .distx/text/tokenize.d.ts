/**
 * Per-distinct-token results: raw token (as written) -> Porter stem, or `''` when the token is
 * dropped (stop word, no letter, too long). Create one per index build with {@link createStemCache};
 * never share one across unrelated runs through module state.
 */
export type StemCache = Map<string, string>;
/** A fresh, empty {@link StemCache}. */
export declare function createStemCache(): StemCache;
/** A kept token: its Porter stem and its UTF-16 start/end offsets in the input string. */
export interface Token {
    readonly stem: string;
    readonly start: number;
    readonly end: number;
}
/**
 * Stem of one raw token, or `''` when it is dropped.
 * @param raw a token as written (any case)
 * @param cache per-run cache (see {@link StemCache})
 */
export declare function stemToken(raw: string, cache: StemCache): string;
/** True when the lower-cased word is on natural's English stop word list. */
export declare function isStopWord(word: string): boolean;
/**
 * Calls `visit(raw, start, end)` for every word of `text` in order (natural's word boundaries),
 * stop words included. The callback form keeps the hot loop free of per-token objects.
 */
export declare function forEachWord(text: string, visit: (raw: string, start: number, end: number) => void): void;
/**
 * Stems of the words of `text`: lower-cased, stop words dropped, Porter-stemmed.
 * @param text any plain text
 * @param cache optional per-run stem cache; a private one is used when omitted
 * @example tokenize('Caching the ponies') // ['cach', 'poni']
 */
export declare function tokenize(text: string, cache?: StemCache): string[];
/**
 * Like {@link tokenize}, with each kept token's UTF-16 `start`/`end` offsets in `text`
 * (`text.slice(start, end)` is the word as written).
 */
export declare function tokenizeWithOffsets(text: string, cache?: StemCache): Token[];
