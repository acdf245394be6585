/** The parse stage: source files -> page facts (pure; the only stage importing remark/rehype). */
export { parseSource } from './parse-file.js';
export { parseNavigation } from './navigation.js';
export { parseRedirects } from './redirects.js';
export { buildLineIndex, positionOf, lineOf, lineStart } from '../util/line-index.js';
export { codeSpanText, collapseSpace } from './spans.js';
export { anchorForReading, htmlFragmentText } from './html-text.js';
export type { LineIndex } from '../util/line-index.js';
export { MAX_NESTING, MAX_MARKERS_PER_PARAGRAPH, MAX_PARAGRAPH_CHARS } from './assess.js';
export type { Redirect, LineProblem } from './types.js';
