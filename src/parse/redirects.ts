/**
 * The redirects file (DESIGN section 3): `from to` per line; blank lines and `#` comments (whole
 * lines, or after the fields) are ignored. A third field that is an HTTP status (`301`, `302!`,
 * as static hosts write them) is accepted and ignored; any other field count is a problem at its
 * line, and the line is skipped.
 */
import type { LineProblem, Redirect } from './types.js';

const STATUS = /^[1-5]\d\d!?$/;

/**
 * Read a redirects file.
 * @param file the file's path (problems carry only the line: the caller names the file)
 * @param text its content
 */
export function parseRedirects(_file: string, text: string): { redirects: Redirect[]; problems: LineProblem[] } {
  const redirects: Redirect[] = [];
  const problems: LineProblem[] = [];
  const src = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const rows = src.split(/\r\n|\r|\n/);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i].replace(/(?:^|\s)#.*$/, '').trim();
    if (row === '') continue;
    const fields = row.split(/\s+/);
    const line = i + 1;
    if (fields.length === 2 || (fields.length === 3 && STATUS.test(fields[2]))) {
      redirects.push({ from: fields[0], to: fields[1], line });
    } else {
      problems.push({
        line,
        message: `${fields.length} field${fields.length === 1 ? '' : 's'} where a redirect needs "from to" (and an optional status code); the line is skipped`,
      });
    }
  }
  return { redirects, problems };
}
