/** The rules stage: one module per rule, an explicit list, and the engine that runs them. */
export { rules } from './registry.js';
export { runRules, validateRuleConfig } from './engine.js';
export type { RuleSetting } from './engine.js';
export type { Rule, RuleContext, RuleFinding, SourceWarning, AuxProblem } from './types.js';
export { brokenLink } from './broken-link.js';
export { brokenFragment } from './broken-fragment.js';
export { orphanPage } from './orphan-page.js';
export type { OrphanPageOptions } from './orphan-page.js';
export { unreachablePage } from './unreachable-page.js';
export { clickDepth } from './click-depth.js';
export { deadEnd } from './dead-end.js';
export type { DeadEndOptions } from './dead-end.js';
export { sourceProblem } from './source-problem.js';
export { duplicateRoute } from './duplicate-route.js';
export { missingEntry } from './missing-entry.js';
export { boundedDistance, nearest } from './nearest.js';
export { contentOutlinks, entrySet, isDeadEnd, isOrphan, isUnreachable } from './structure.js';
