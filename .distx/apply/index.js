/** The apply stage: planning link insertions into sources (pure; the CLI reads and writes). */
export { classifyHref, countStyles, addCounts, majority, chooseStyle } from './style.js';
export { hrefFor, linkMarkup, relativeFilePath, relativeRoute } from './markup.js';
export { planFile } from './plan.js';
export { selectSuggestions, groupByFile, NO_ANCHOR } from './select.js';
export { unifiedDiff } from './diff.js';
export { hadBom, encodeText } from './bytes.js';
export { LINK_STYLES } from './types.js';
