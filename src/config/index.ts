/**
 * The configuration: the documented `Config` type users write (config.ts), the zod schema with
 * every default and `resolveOptions` (options.ts), the words of its error messages (issues.ts)
 * and finding the configuration file for the CLI (discover.ts).
 */
export { resolveOptions, DEFAULT_OPTIONS, LEVELS } from './options.js';
export type { ResolvedOptions, SchemaInput } from './options.js';
export type * from './config.js';
export { describeAccepted, describeIssue, expectedGot, oldFormProblem } from './issues.js';
export { loadConfig, CONFIG_FILE_NAMES } from './discover.js';
export type { LoadedConfig } from './discover.js';
