/**
 * The page script's link-graph interaction: the search box (Enter focuses the first match),
 * the focused view of one page (the pages linking to it and those it links to, laid out in
 * two columns sorted by PageRank: no randomness), the side panel that lists the same pages as
 * text (keyboard and screen-reader usable), hover tips and clicks on the canvas.
 * Plain browser JavaScript kept as a string (see client-core.ts).
 */
export declare const CLIENT_GRAPH: string;
