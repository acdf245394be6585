import { compareText } from '../rules/structure.js';
/** Decide the gate. `findings` are the ones that count (a baseline may have removed known ones). */
export function evaluateGate(findings, stats, options) {
    const failures = [];
    const counts = new Map();
    for (const f of findings) {
        if (f.severity === 'error' || options.failOn === 'warning')
            counts.set(f.rule, (counts.get(f.rule) ?? 0) + 1);
    }
    for (const [rule, actual] of counts)
        failures.push({ rule, limit: 0, actual });
    const { gate } = options;
    const above = (key, actual) => {
        const limit = gate[key];
        if (limit !== null && actual !== null && actual > limit)
            failures.push({ rule: `gate.${key}`, limit, actual });
    };
    above('maxDepth', stats.maxDepth);
    above('maxOrphans', stats.orphans);
    above('maxBrokenLinks', stats.brokenLinks);
    above('maxBrokenFragments', stats.brokenFragments);
    above('maxUnreachable', stats.unreachable);
    above('maxWarnings', findings.filter((f) => f.severity === 'warning').length);
    const min = gate.minInlinksForImportant;
    if (min !== null && stats.fewestImportantInlinks !== null && stats.fewestImportantInlinks < min) {
        failures.push({ rule: 'gate.minInlinksForImportant', limit: min, actual: stats.fewestImportantInlinks });
    }
    failures.sort((a, b) => compareText(a.rule, b.rule));
    return { passed: failures.length === 0, failOn: options.failOn, failures };
}
