import type { Rule } from './types.js';
/**
 * `source-problem`: every source file can be read and parsed, and the auxiliary files
 * (navigation, redirects, traffic) are well formed.
 *
 * Reports the problems `parse` recorded in `PageFacts.problems` (at the problem's line and
 * column, else 1:1), the warnings `collect` met (symlinks leaving the root, unreadable or
 * vanished files) and problems in auxiliary files. A file that cannot be read or parsed
 * (`parse-failed`, `binary`, `unreadable`) is an error; the rest (invalid UTF-8, front matter,
 * a file too large, too many links...) are warnings. A severity set in the configuration
 * applies to all of them. `target` is the problem code.
 *
 * Options: none. Default severity: per finding as above.
 *
 * @example ok: a Markdown file with valid YAML front matter.
 * @example not ok: front matter `title: [unclosed` (the message is the parse stage's):
 * `guide/setup.md:2:17  warning  Invalid YAML frontmatter: Flow sequence in block collection must
 * be sufficiently indented and end with a ]; the page is read without its frontmatter  source-problem`
 */
export declare const sourceProblem: Rule;
