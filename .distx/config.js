/**
 * The configuration as a user writes it, documented key by key. One type for every entry
 * point: the CLI's `linkweave.config.json`, `analyze()`, the unified collector and the
 * Vite/Rollup plugin. The defaults are applied by `resolveOptions` (src/options.ts, the only
 * place that holds them); `test/types/config.test-d.ts` checks that this interface is exactly
 * the schema's input type, so the two cannot drift apart.
 */
export {};
