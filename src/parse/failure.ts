/** How a parser failure becomes a problem on the page (the page is then read by the simple scanner). */
import type { ProblemDraft } from './types.js';

/** True for the error V8 throws when a tree is too deep for the call stack. */
export function isStackOverflow(error: unknown): boolean {
  return error instanceof RangeError && /call stack/i.test(error.message);
}

/** The message of any thrown value. */
export function describeError(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/**
 * The problem for a parser that failed on a whole page.
 * @param parser which parser failed (`Markdown`, `HTML`)
 * @param error what it threw
 */
export function parserFailure(parser: 'Markdown' | 'HTML', error: unknown): ProblemDraft {
  const tail = 'the page is read with a simple scan (links and headings only, no places to insert links)';
  return isStackOverflow(error)
    ? { code: 'deep-nesting', message: `${parser === 'HTML' ? 'Elements' : 'Blocks'} nest too deep to parse; ${tail}` }
    : { code: 'parse-failed', message: `The ${parser} parser failed (${describeError(error)}); ${tail}` };
}
