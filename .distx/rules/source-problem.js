/** Problem codes that mean the file could not be read as a page at all. */
const FATAL = new Set(['parse-failed', 'binary', 'unreadable']);
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
export const sourceProblem = {
    id: 'source-problem',
    description: 'Source files can be read and parsed.',
    defaultSeverity: 'error',
    defaultOptions: {},
    check(ctx) {
        const findings = [];
        for (const facts of ctx.facts) {
            for (const problem of facts.problems)
                findings.push(fromProblem(facts.file, facts.route, problem));
        }
        for (const warning of ctx.warnings) {
            findings.push({
                file: warning.file,
                line: 1,
                column: 1,
                route: '',
                message: warning.message,
                target: warning.code,
                severity: FATAL.has(warning.code) ? 'error' : 'warning',
            });
        }
        for (const problem of ctx.auxProblems ?? []) {
            findings.push({
                file: problem.file,
                line: Math.max(1, problem.line),
                column: 1,
                route: '',
                message: problem.message,
                target: 'aux-file',
                severity: 'warning',
            });
        }
        return findings;
    },
};
function fromProblem(file, route, problem) {
    return {
        file,
        line: Math.max(1, problem.line ?? 1),
        column: Math.max(1, problem.column ?? 1),
        route,
        message: problem.message,
        target: problem.code,
        severity: FATAL.has(problem.code) ? 'error' : 'warning',
    };
}
