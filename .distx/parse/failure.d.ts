/** How a parser failure becomes a problem on the page (the page is then read by the simple scanner). */
import type { ProblemDraft } from './types.js';
/** True for the error V8 throws when a tree is too deep for the call stack. */
export declare function isStackOverflow(error: unknown): boolean;
/** The message of any thrown value. */
export declare function describeError(error: unknown): string;
/**
 * The problem for a parser that failed on a whole page.
 * @param parser which parser failed (`Markdown`, `HTML`)
 * @param error what it threw
 */
export declare function parserFailure(parser: 'Markdown' | 'HTML', error: unknown): ProblemDraft;
