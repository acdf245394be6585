/**
 * The page script's focused view: one page in the centre, the pages linking to it on the left,
 * the pages it links to on the right (each column sorted by PageRank, so the picture follows
 * from the data alone), and the canvas's text alternative. Plain browser JavaScript kept as a
 * string (see client-core.ts); uses the primitives of client-draw.ts.
 */
export declare const CLIENT_FOCUS: string;
