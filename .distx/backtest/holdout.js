import { shuffle, streamFor } from './prng.js';
import { lineStarts, linkTextRange, positionOf, withoutWords, withSpans } from './unlink.js';
/** The pairs of content links between different pages, sorted by source then target. */
export function contentPairs(graph) {
    const byKey = new Map();
    const n = graph.pages.length;
    for (const l of graph.links) {
        if (l.from < 0 || l.to < 0 || l.from === l.to || l.context !== 'content')
            continue;
        const key = l.from * n + l.to;
        const list = byKey.get(key);
        if (list === undefined)
            byKey.set(key, [l]);
        else
            list.push(l);
    }
    return [...byKey.keys()]
        .sort((a, b) => a - b)
        .map((key) => ({ source: Math.floor(key / n), target: key % n, links: byKey.get(key) }));
}
/** Pairs that may be held out: neither page excluded. */
export function eligiblePairs(graph, pairs) {
    return pairs.filter((p) => !graph.pages[p.source].meta.exclude && !graph.pages[p.target].meta.exclude);
}
/**
 * Hold out a seeded share of the content-link pairs.
 * @param share in (0, 1]
 * @param seed any safe integer
 */
export function holdOut(input, share, seed) {
    const { graph } = input;
    const all = input.pairs ?? contentPairs(graph);
    const eligible = eligiblePairs(graph, all);
    const want = eligible.length === 0 ? 0 : Math.max(1, Math.round(share * eligible.length));
    const inlinksLeft = new Int32Array(graph.pages.length);
    for (const p of all)
        inlinksLeft[p.target]++;
    const chosen = [];
    for (const i of shuffle(streamFor(seed, 0), eligible.map((_, i) => i))) {
        if (chosen.length >= want)
            break;
        const t = eligible[i].target;
        if (inlinksLeft[t] < 2)
            continue;
        inlinksLeft[t]--;
        chosen.push(i);
    }
    chosen.sort((a, b) => a - b);
    return removePairs(input, chosen.map((i) => eligible[i]));
}
/** Remove every content link of the given pairs from the facts (pure; the input is not changed). */
export function removePairs(input, pairs) {
    const { graph } = input;
    const removed = new Map();
    for (const p of pairs) {
        const f = graph.pages[p.source].factsIndex;
        const set = removed.get(f) ?? new Set();
        for (const l of p.links)
            set.add(l.raw);
        removed.set(f, set);
    }
    const facts = [...input.facts];
    const located = new Map();
    const startsOf = new Map();
    for (const [f, set] of removed) {
        const page = input.facts[f];
        const source = input.sourceText(page.file);
        const starts = source === undefined ? [] : lineStarts(source);
        startsOf.set(f, starts);
        const ranges = [];
        for (const raw of set) {
            const range = source === undefined ? null : linkTextRange(source, starts, raw, page.kind);
            located.set(raw, range);
            if (range !== null)
                ranges.push(range);
        }
        const keep = input.keepLinkText === true;
        facts[f] = {
            ...page,
            links: page.links.filter((l) => !set.has(l)),
            text: keep ? page.text : withoutWords(page.text, [...set].map((l) => l.text)),
            spans: source === undefined || !keep ? page.spans : withSpans(page.spans, source, starts, ranges),
        };
    }
    const heldOut = pairs.map((p) => ({
        source: p.source,
        target: p.target,
        links: p.links.map((l) => {
            const range = located.get(l.raw) ?? null;
            const starts = startsOf.get(graph.pages[p.source].factsIndex) ?? [];
            return {
                textLine: range === null || starts.length === 0 ? l.raw.line : positionOf(starts, range.start).line,
                line: l.raw.line,
                column: l.raw.column,
                text: l.raw.text,
                offset: range === null ? -1 : range.start,
                endOffset: range === null ? -1 : range.end,
            };
        }),
    }));
    return { facts, heldOut };
}
