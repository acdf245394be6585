/**
 * GFM literal autolinks (bare `https://…`, `www.…` and e-mail addresses, GFM spec section
 * "Autolinks (extension)"), found in the text nodes of the tree.
 *
 * Written by hand because the library is measurably slower on the hot path: with
 * `micromark-extension-gfm-autolink-literal` in the tokenizer, remark-gfm parsing took about
 * 1.75x as long as plain remark-parse on the generated bench pages (3.2 s against 1.8 s for
 * 1,000 pages), and its tree pass alone (a find-and-replace over every text node with four
 * expressions) about 1.25x. Here a text node is looked at only when it holds `://`, `www.` or
 * `@`, and it is read with the rules remark-gfm applies (its tree pass, with the tokenizer's
 * reading of `<` and of e-mail addresses), so the links found are the same; a test compares
 * them with remark-gfm on a corpus of cases and on random text.
 *
 * What differs: without the tokenizer extension, Markdown inside an address is read as
 * Markdown, so `https://x.org/_a_/b` is the link `https://x.org/` followed by emphasis, and a
 * bare address inside raw `<a>…</a>` is not a second link. These are external links, which the
 * report counts but never checks.
 */
/** A literal link in a text: `value.slice(index, index + text.length) === text`. */
export interface LiteralLink {
    readonly index: number;
    readonly text: string;
    readonly href: string;
}
/** Quick test: can `value` hold a literal link at all? (No expression runs on most text.) */
export declare function mayHoldLiteralLink(value: string): boolean;
/**
 * The literal links of one text node's value, in order.
 * @param value the text node's value
 */
export declare function findLiteralLinks(value: string): LiteralLink[];
