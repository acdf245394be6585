/**
 * Choose suggestions greedily.
 * @returns chosen pairs in the order they were chosen
 */
export function chooseSuggestions(pairs, maxPerSource, maxPerTarget) {
    const before = (a, b) => {
        if (a.score !== b.score)
            return a.score > b.score;
        const pa = pairs[a.pair];
        const pb = pairs[b.pair];
        return pa.target !== pb.target ? pa.target < pb.target : pa.source < pb.source;
    };
    const heap = new Heap(before);
    pairs.forEach((p, i) => heap.push({ pair: i, score: p.anchors.length > 0 ? p.score : Math.min(p.score, p.scoreWithoutAnchor), option: p.anchors.length > 0 ? 0 : -1 }));
    const perSource = new Map();
    const perTarget = new Map();
    const used = new Map();
    const out = [];
    for (let e = heap.pop(); e !== undefined; e = heap.pop()) {
        const pair = pairs[e.pair];
        if ((perSource.get(pair.source) ?? 0) >= maxPerSource || (perTarget.get(pair.target) ?? 0) >= maxPerTarget)
            continue;
        let anchor = null;
        if (e.option >= 0) {
            const taken = used.get(pair.source) ?? [];
            const free = (a) => !taken.some(([s, t]) => a.offset < t && s < a.endOffset);
            let k = e.option;
            while (k < pair.anchors.length && !free(pair.anchors[k]))
                k++;
            if (k === pair.anchors.length) {
                heap.push({ pair: e.pair, score: Math.min(pair.score, pair.scoreWithoutAnchor), option: -1 });
                continue;
            }
            anchor = pair.anchors[k];
            taken.push([anchor.offset, anchor.endOffset]);
            used.set(pair.source, taken);
        }
        perSource.set(pair.source, (perSource.get(pair.source) ?? 0) + 1);
        perTarget.set(pair.target, (perTarget.get(pair.target) ?? 0) + 1);
        out.push({ pair, anchor, score: e.score });
    }
    return out;
}
/** A binary heap; `before(a, b)` is true when a comes out first. */
class Heap {
    before;
    items = [];
    constructor(before) {
        this.before = before;
    }
    push(item) {
        const items = this.items;
        items.push(item);
        let i = items.length - 1;
        while (i > 0) {
            const parent = (i - 1) >> 1;
            if (!this.before(items[i], items[parent]))
                break;
            [items[i], items[parent]] = [items[parent], items[i]];
            i = parent;
        }
    }
    pop() {
        const items = this.items;
        if (items.length === 0)
            return undefined;
        const top = items[0];
        const last = items.pop();
        if (items.length > 0) {
            items[0] = last;
            let i = 0;
            for (;;) {
                const l = 2 * i + 1;
                const r = l + 1;
                let best = i;
                if (l < items.length && this.before(items[l], items[best]))
                    best = l;
                if (r < items.length && this.before(items[r], items[best]))
                    best = r;
                if (best === i)
                    break;
                [items[i], items[best]] = [items[best], items[i]];
                i = best;
            }
        }
        return top;
    }
}
