/**
 * A unified diff of one file (`--- a/path`, `+++ b/path`, hunks with 3 lines of context), as
 * `git apply` and `patch -p1` take it; '' when the texts are equal. Lines keep their own line
 * endings (a CRLF file's diff has CRLF lines).
 * @param path the file's path as shown (relative to the working folder)
 */
export declare function unifiedDiff(path: string, before: string, after: string): string;
