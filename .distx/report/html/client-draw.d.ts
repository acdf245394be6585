/**
 * The page script's canvas drawing: primitives, and the overview (pages or folders on rings by
 * click depth, the unreachable box apart); client-focus.ts draws the focused view. The graph is
 * drawn on a canvas, not as SVG elements, so a large site costs one bitmap rather than
 * thousands of DOM nodes; the overview positions come from the formatter (deterministic).
 * Plain browser JavaScript kept as a string (see client-core.ts).
 */
export declare const CLIENT_DRAW: string;
