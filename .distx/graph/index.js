/** The graph stage: parsed facts -> the site's internal link graph. */
export { buildGraph } from './build.js';
export { resolveLink } from './resolve.js';
export { pageSource, navigationSource, fileUrlOf, SITE_ORIGIN } from './source.js';
export { removeDotSegments, joinPath } from './paths.js';
export { buildRouteIndex, resolveRouteValue } from './routes.js';
export { markTemplateLinks, TEMPLATE_MIN_PAGES } from './template.js';
export { buildCsr, transpose, outWeightSums, createEdgeList, pushEdge, EDGE_CONTENT, EDGE_TEMPLATE } from './csr.js';
export { selectPages, canonicalRoute, compareStrings } from './pages.js';
export { normalizeRoute, canonicalPath, routeKeyOf, lookupRoute, lookupKey, encodeRouteSegment, decodeRouteSegment, decodePathSegments, normalizedBasePath, withBasePath, extensionOf, isSourceExtension, isMarkdownExtension, } from './normalize.js';
