/**
 * The built-in rules, an explicit list (no directory scan, nothing registered by importing).
 * Adding a rule: write `rules/<id>.ts`, add it here and to `rules/index.ts`'s re-exports.
 */
import type { Rule } from './types.js';
/** Every built-in rule, sorted by id. */
export declare const rules: readonly Rule[];
