/**
 * The markup of a new link: the href in the chosen style and the text inserted around the
 * anchor. Markdown: `[anchor](href)`; HTML: `<a href="href">anchor</a>`. The anchor itself is
 * never touched (it is source text already: escapes and entities stay as written).
 *
 * The one definition for every writer of links: `apply` inserts this markup, and the SARIF
 * fix proposes the same text (`linkText`).
 */
import { extensionOf, isSourceExtension } from './extensions.js';
import { encodeRouteSegment } from './normalize.js';
import type { FileKind } from '../types.js';

/**
 * How a new link names its target:
 * - `relative`: the target's source file relative to the source file (`../guides/calibration.md`),
 *   how authors link Markdown files; in an HTML source, the target's route relative to the page
 *   (`../guides/calibration/`);
 * - `absolute`: the site-absolute route (`/guides/calibration/`);
 * - `route-relative`: the target's route relative to the page's route, as a browser resolves it
 *   (`../calibration/`); the same as `relative` in HTML.
 */
export type LinkStyle = 'relative' | 'absolute' | 'route-relative';

/** The link styles, for the `--link-style` flag. */
export const LINK_STYLES: readonly LinkStyle[] = ['relative', 'absolute', 'route-relative'];

/** The page a link goes to. */
export interface LinkTarget {
  readonly route: string;
  readonly file: string;
}

/** The page a link is written in. */
export interface LinkSource {
  readonly file: string;
  readonly kind: FileKind;
  readonly route: string;
  /** HTML `<base href>`: relative links would resolve against it, so links are written absolute. */
  readonly baseHref?: string;
}

/**
 * Characters percent-encoded in an href beyond a route's own encoding: the ones that end or
 * break a Markdown link destination or an HTML attribute (space, quotes, brackets, parentheses,
 * angle brackets, backslash, backtick, controls). Other characters, non-ASCII included, stay
 * as written: CommonMark and HTML take them, and the resolver decodes either form.
 */
const UNSAFE = /[\u0000-\u0020\u007f"'()<>[\]\\`]/g;

function safe(href: string): string {
  return href.replace(UNSAFE, (ch) => `%${ch.charCodeAt(0).toString(16).toUpperCase().padStart(2, '0')}`);
}

/** `to` (a path relative to the root) relative to the folder of `from` (also relative to the root). */
export function relativeFilePath(from: string, to: string): string {
  const dir = from.split('/').slice(0, -1);
  const target = to.split('/');
  let i = 0;
  while (i < dir.length && i < target.length - 1 && dir[i] === target[i]) i++;
  const rel = [...dir.slice(i).map(() => '..'), ...target.slice(i).map(encodeRouteSegment)].join('/');
  return rel;
}

/**
 * Route `to` relative to the URL of route `from` (both site-absolute paths), as a browser
 * resolves a relative link on the page at `from`: `/a/b/` -> `/a/c/` is `../c/`.
 */
export function relativeRoute(from: string, to: string): string {
  const dir = from.split('/').slice(0, -1);
  const target = to.split('/');
  let i = 0;
  while (i < dir.length && i < target.length - 1 && dir[i] === target[i]) i++;
  const rel = [...dir.slice(i).map(() => '..'), ...target.slice(i)].join('/');
  return rel === '' ? './' : rel;
}

/**
 * The href of a new link from `source` to `target` in `style`.
 * - HTML source: a relative URL to the target's route (`relative`, `route-relative`) or the
 *   route; always the route when the page has a `<base href>`.
 * - Markdown source: the target's source file relative to the source file (`relative`), the
 *   route (`absolute`), or the route relative to the page's route (`route-relative`); a
 *   relative route that ends in a source extension would be read as a file link
 *   (DESIGN section 4), so such targets get the absolute route instead.
 */
export function hrefFor(source: LinkSource, target: LinkTarget, style: LinkStyle): string {
  if (source.kind === 'html') {
    return safe(style === 'absolute' || source.baseHref !== undefined ? target.route : relativeRoute(source.route, target.route));
  }
  if (style === 'relative') return safe(relativeFilePath(source.file, target.file));
  if (style === 'route-relative' && !isSourceExtension(extensionOf(target.route))) {
    return safe(relativeRoute(source.route, target.route));
  }
  return safe(target.route);
}

/** The text inserted before and after the anchor. */
export function linkMarkup(kind: LinkSource['kind'], href: string): { open: string; close: string } {
  if (kind === 'html') return { open: `<a href="${href.replace(/&/g, '&amp;').replace(/"/g, '&quot;')}">`, close: '</a>' };
  return { open: '[', close: `](${href})` };
}

/** The whole link `apply` writes in place of `anchor`: `linkMarkup` around the anchor, with `hrefFor`'s href. */
export function linkText(source: LinkSource, target: LinkTarget, style: LinkStyle, anchor: string): string {
  const { open, close } = linkMarkup(source.kind, hrefFor(source, target, style));
  return open + anchor + close;
}
