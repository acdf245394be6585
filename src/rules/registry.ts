/**
 * The built-in rules, an explicit list (no directory scan, nothing registered by importing).
 * Adding a rule: write `rules/<id>.ts`, add it here and to `rules/index.ts`'s re-exports.
 */
import type { Rule } from './types.js';
import { brokenLink } from './broken-link.js';
import { brokenFragment } from './broken-fragment.js';
import { orphanPage } from './orphan-page.js';
import { unreachablePage } from './unreachable-page.js';
import { clickDepth } from './click-depth.js';
import { deadEnd } from './dead-end.js';
import { sourceProblem } from './source-problem.js';
import { duplicateRoute } from './duplicate-route.js';
import { missingEntry } from './missing-entry.js';

/** Every built-in rule, sorted by id. */
export const rules: readonly Rule[] = [
  brokenFragment,
  brokenLink,
  clickDepth,
  deadEnd,
  duplicateRoute,
  missingEntry,
  orphanPage,
  sourceProblem,
  unreachablePage,
];
