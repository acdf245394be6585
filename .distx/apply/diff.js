/** The unified diff `apply --dry-run` prints, made with the `diff` package (jsdiff). */
import { FILE_HEADERS_ONLY, formatPatch, structuredPatch } from 'diff';
/**
 * A unified diff of one file (`--- a/path`, `+++ b/path`, hunks with 3 lines of context), as
 * `git apply` and `patch -p1` take it; '' when the texts are equal. Lines keep their own line
 * endings (a CRLF file's diff has CRLF lines).
 * @param path the file's path as shown (relative to the working folder)
 */
export function unifiedDiff(path, before, after) {
    if (before === after)
        return '';
    const patch = structuredPatch(`a/${path}`, `b/${path}`, before, after, undefined, undefined, { context: 3 });
    return formatPatch(patch, FILE_HEADERS_ONLY);
}
