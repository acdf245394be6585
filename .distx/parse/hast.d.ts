/**
 * One walk over an HTML tree (hast from rehype-parse) for both HTML pages and raw HTML inside
 * Markdown: links (`<a href>`, `<area href>`), fragment targets, and for whole pages also the
 * title, headings, body text and spans.
 *
 * - Links inside `nav`, `header`, `footer`, `aside` are template links (DESIGN section 4).
 * - `rel` containing `nofollow` marks a link nofollow (WHATWG HTML, link types).
 * - Fragment targets: `id` of any element, and `name` of an `a` element (WHATWG HTML, "the
 *   indicated part of the document").
 * - The first `<base>` with an `href` is recorded (WHATWG HTML: only the first such element counts).
 */
import type { Element, Root } from 'hast';
import type { PageDraft } from './types.js';
/** How to walk one tree. */
export interface HastContext {
    /** The page's source text (spans are checked against it). */
    readonly src: string;
    readonly draft: PageDraft;
    /** Map an offset in the parsed HTML to an offset in `src` (identity for whole pages). */
    readonly map: (offset: number) => number;
    /** Whole page: also title, headings, body text and spans. Fragment: links and ids only. */
    readonly document: boolean;
}
/** What a walk found about its links (raw HTML in Markdown needs the count). */
export interface HastWalkResult {
    /** Links added, in document order. */
    readonly links: number;
}
/**
 * Walk a hast tree and add what it holds to the draft.
 * @param root the tree
 * @param ctx the page and the offset mapping
 * @param template true when the tree sits inside a template region already
 */
export declare function walkHast(root: Root, ctx: HastContext, template?: boolean): HastWalkResult;
/**
 * Plain text of an element: its text nodes, and `alt` of images, in document order (script and
 * style content left out).
 * @param node a hast element
 */
export declare function plainText(node: Element): string;
