import { brokenLink } from './broken-link.js';
import { brokenFragment } from './broken-fragment.js';
import { orphanPage } from './orphan-page.js';
import { unreachablePage } from './unreachable-page.js';
import { maxClickDepth } from './max-click-depth.js';
import { deadEnd } from './dead-end.js';
import { sourceProblem } from './source-problem.js';
import { duplicateRoute } from './duplicate-route.js';
import { missingEntry } from './missing-entry.js';
/** Every built-in rule, sorted by id. */
export const rules = [
    brokenFragment,
    brokenLink,
    deadEnd,
    duplicateRoute,
    maxClickDepth,
    missingEntry,
    orphanPage,
    sourceProblem,
    unreachablePage,
];
