/** The graph stage: parsed facts -> the site's internal link graph. */
export { buildGraph } from './build.js';
export { resolveLink } from './resolve.js';
export { pageSource, navigationSource, fileUrlOf, SITE_ORIGIN } from './link-source.js';
export type { ResolveContext } from './resolve.js';
export type { LinkSource } from './link-source.js';
export { buildRouteIndex, resolveRouteValue } from './routes.js';
export type { RouteValue, IndexedPage, RouteIndexes } from './routes.js';
export { markTemplateLinks, TEMPLATE_MIN_PAGES } from './template.js';
export { buildCsr, transpose, outWeightSums, createEdgeList, pushEdge, EDGE_CONTENT, EDGE_TEMPLATE } from './csr.js';
export { selectPages, canonicalRoute } from './pages.js';
export type { DuplicateRoute, PageSelection } from './pages.js';
export type { GraphInput, GraphRedirect, RedirectEnd, EdgeList } from './types.js';
