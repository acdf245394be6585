import type { LinkSource, LinkStyle, LinkTarget } from './types.js';
/** `to` (a path relative to the root) relative to the folder of `from` (also relative to the root). */
export declare function relativeFilePath(from: string, to: string): string;
/**
 * Route `to` relative to the URL of route `from` (both site-absolute paths), as a browser
 * resolves a relative link on the page at `from`: `/a/b/` -> `/a/c/` is `../c/`.
 */
export declare function relativeRoute(from: string, to: string): string;
/**
 * The href of a new link from `source` to `target` in `style`.
 * - HTML source: a relative URL to the target's route (`relative`, `route-relative`) or the
 *   route; always the route when the page has a `<base href>`.
 * - Markdown source: the target's source file relative to the source file (`relative`), the
 *   route (`absolute`), or the route relative to the page's route (`route-relative`); a
 *   relative route that ends in a source extension would be read as a file link
 *   (DESIGN section 4), so such targets get the absolute route instead.
 */
export declare function hrefFor(source: LinkSource, target: LinkTarget, style: LinkStyle): string;
/** The text inserted before and after the anchor. */
export declare function linkMarkup(kind: LinkSource['kind'], href: string): {
    open: string;
    close: string;
};
