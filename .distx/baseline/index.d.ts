/** Baselines: the findings a project has accepted for now, and matching two runs' findings. */
export { findingKey, matchFindings } from './match.js';
export type { FindingMatch } from './match.js';
export { BASELINE_SCHEMA, formatBaseline, toBaseline, compareBaselineEntries } from './format.js';
export type { Baseline } from './format.js';
export { parseBaseline } from './read.js';
export { parseJsonText, checkShape } from './json.js';
export { findingSchema, suggestionSchema } from './schema.js';
