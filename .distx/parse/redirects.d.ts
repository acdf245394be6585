/**
 * The redirects file (DESIGN section 3): `from to` per line; blank lines and `#` comments (whole
 * lines, or after the fields) are ignored. A third field that is an HTTP status (`301`, `302!`,
 * as static hosts write them) is accepted and ignored; any other field count is a problem at its
 * line, and the line is skipped.
 */
import type { LineProblem, Redirect } from './types.js';
/**
 * Read a redirects file.
 * @param file the file's path (problems carry only the line: the caller names the file)
 * @param text its content
 */
export declare function parseRedirects(_file: string, text: string): {
    redirects: Redirect[];
    problems: LineProblem[];
};
