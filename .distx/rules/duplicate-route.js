/**
 * `duplicate-route`: no two source files produce the same route.
 *
 * The first file by path keeps the route; each other file is reported at its line 1,
 * column 1, naming the kept file. `target` is the reported file, so two duplicates of one
 * route stay apart in a baseline.
 *
 * Options: none. Default severity: `error`.
 *
 * @example ok: `guide.md` and `guide/index.md` with `slug: /guide-overview/`.
 * @example not ok: `guide.md` and `guide/index.md` both map to `/guide/`:
 * `guide/index.md:1:1  error  Unexpected second file for route /guide/, expected one file per
 * route (guide.md has it)  duplicate-route`
 */
export const duplicateRoute = {
    id: 'duplicate-route',
    description: 'Every route comes from one source file.',
    defaultSeverity: 'error',
    defaultOptions: {},
    check(ctx) {
        const findings = [];
        for (const dup of ctx.graph.duplicates) {
            findings.push({
                file: dup.file,
                line: 1,
                column: 1,
                route: dup.route,
                message: `Unexpected second file for route ${dup.route}, expected one file per route (${dup.keptFile} has it)`,
                target: dup.file,
            });
        }
        return findings;
    },
};
