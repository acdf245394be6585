/** True for the error V8 throws when a tree is too deep for the call stack. */
export function isStackOverflow(error) {
    return error instanceof RangeError && /call stack/i.test(error.message);
}
/** The message of any thrown value. */
export function describeError(error) {
    return error instanceof Error ? error.message : String(error);
}
/**
 * The problem for a parser that failed on a whole page.
 * @param parser which parser failed (`Markdown`, `HTML`)
 * @param error what it threw
 */
export function parserFailure(parser, error) {
    const tail = 'the page is read with a simple scan (links and headings only, no places to insert links)';
    return isStackOverflow(error)
        ? { code: 'deep-nesting', message: `Unexpected ${parser === 'HTML' ? 'element ' : ''}nesting too deep to parse; ${tail}` }
        : { code: 'parse-failed', message: `Unexpected failure of the ${parser} parser (${describeError(error)}); ${tail}` };
}
