/**
 * The ground floor of routes: URL path normalisation, dot segments, the route of a source
 * file and the source extensions. Any stage may import it; it imports no stage.
 */
export {
  normalizeRoute,
  canonicalPath,
  routeKeyOf,
  lookupRoute,
  lookupKey,
  encodeRouteSegment,
  decodeRouteSegment,
  decodePathSegments,
  normalizedBasePath,
  withBasePath,
} from './normalize.js';
export { DOT_SEGMENT, removeDotSegments, joinPath, stripIndexFile, filePathOf, decodeFragment, pathPart } from './paths.js';
export { routeOfFile } from './of-file.js';
export { styleFromLinks, STYLE_EVIDENCE_LINKS } from './style-from-links.js';
export type { StyleFromLinks } from './style-from-links.js';
export {
  MARKDOWN_EXTENSIONS,
  HTML_EXTENSIONS,
  SOURCE_EXTENSIONS,
  SOURCE_GLOB,
  SOURCE_EXTENSION_END,
  MARKDOWN_EXTENSION_END,
  HTML_EXTENSION_END,
  isSourceExtension,
  isMarkdownExtension,
  kindOfExtension,
  kindOfPath,
  extensionOf,
  hasSourceExtension,
} from './extensions.js';
export type { RouteOptions } from './types.js';
export { LINK_STYLES, hrefFor, linkMarkup, linkText, relativeFilePath, relativeRoute } from './link-markup.js';
export type { LinkSource, LinkStyle, LinkTarget } from './link-markup.js';
