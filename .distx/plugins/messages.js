/**
 * Findings as vfile messages, the unified ecosystem's own currency: `ruleId`, `source:
 * 'linkweave'`, the place (line, column), `fatal` for errors; suggested links (command
 * `suggest`) as info messages. Reporters such as vfile-reporter print them like any lint rule's.
 */
import { resolve } from 'node:path';
import { SUGGESTION_RULE } from '../report/index.js';
/** The `source` of every message linkweave adds. */
export const MESSAGE_SOURCE = 'linkweave';
/** Absolute path of a vfile (its `path` against its `cwd`), or null when it has none. */
export function absolutePathOf(file) {
    return file.path === undefined || file.path === '' ? null : resolve(file.cwd, file.path);
}
/**
 * Add the report's findings (and suggestions) for one file to it as messages.
 * @param rel the file's path relative to the content root, as the report names it
 * @returns the messages added, in report order
 */
export function attachReport(file, rel, report) {
    const added = [];
    for (const f of report.findings) {
        if (f.file !== rel)
            continue;
        const message = file.message(f.message, { place: placeOf(f.line, f.column), ruleId: f.rule, source: MESSAGE_SOURCE });
        message.fatal = f.severity === 'error';
        added.push(message);
    }
    for (const s of report.suggestions) {
        if (s.file !== rel)
            continue;
        const reason = s.anchor === null ? `Suggested link to ${s.target} (no anchor phrase): ${s.reason}` : `Suggested link "${s.anchor}" -> ${s.target}: ${s.reason}`;
        added.push(file.info(reason, { place: placeOf(s.line, s.column), ruleId: SUGGESTION_RULE, source: MESSAGE_SOURCE }));
    }
    return added;
}
function placeOf(line, column) {
    return line > 0 ? { line, column: Math.max(column, 1) } : undefined;
}
