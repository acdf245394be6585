import { navigationFile } from './structure.js';
/** A finding about a whole page: line 1, column 1 of its file. */
export function pageFinding(page, message, target) {
    return { file: page.file, line: 1, column: 1, route: page.route, message, ...(target === undefined ? {} : { target }) };
}
/**
 * File and route a link is written in. Navigation links (`from` -1) belong to the navigation
 * file, which is no page: route `''`.
 */
export function linkSource(ctx, link) {
    if (link.from < 0)
        return { file: navigationFile(ctx.options), route: '' };
    const page = ctx.graph.pages[link.from];
    return { file: page.file, route: page.route };
}
/** Fragment without its leading `#`. */
export function bareFragment(fragment) {
    return fragment.startsWith('#') ? fragment.slice(1) : fragment;
}
/** A list of routes for a message: at most three, then "and N more". */
export function listRoutes(routes) {
    if (routes.length <= 3)
        return routes.join(', ');
    return `${routes.slice(0, 3).join(', ')} and ${routes.length - 3} more`;
}
