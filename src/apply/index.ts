/**
 * The apply stage: planning link insertions into sources (pure) and `applySuggestions`, the Node
 * API that reads, checks and writes the files (the `apply` command calls it).
 */
export { applySuggestions } from './run.js';
export type { ApplyInput, ApplyResult, FileStyle } from './run.js';
export { REGION_WORDS, overlappingRegion, changedRegions } from './regions.js';
export type { Insertion } from './regions.js';
export { classifyHref, countStyles, addCounts, majority, chooseStyle } from './style.js';
export type { StyleOrigin } from './style.js';
export { hrefFor, linkMarkup, linkText, relativeFilePath, relativeRoute } from './markup.js';
export { planFile } from './plan.js';
export type { PlanInput } from './plan.js';
export { selectSuggestions, groupByFile, NO_ANCHOR } from './select.js';
export type { Selected, Selection } from './select.js';
export { unifiedDiff } from './diff.js';
export { hadBom, encodeText } from './bytes.js';
export { LINK_STYLES } from './types.js';
export type { AppliedLink, FilePlan, LinkSource, LinkStyle, LinkTarget, NotApplied, RefusalCode, StyleCounts } from './types.js';
