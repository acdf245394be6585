import { tokenize } from '../text/tokenize.js';
import { positionInSpan, prepareSource } from './anchor.js';
import { routeWords } from './names.js';
/** A phrase that names more pages than this is left out of the dictionary. */
export const MAX_PAGES_PER_NAME = 8;
/** Longest name, in kept words. */
export const MAX_NAME_WORDS = 8;
/** Distinct phrases kept per (source, target) pair as anchor options (each at its first mention). */
export const MENTIONS_KEPT = 6;
/**
 * Build the name dictionary and find every mention in the prose of every page.
 * @param factsOf facts by page id (spans give the prose)
 */
export function buildMentionIndex(graph, factsOf, cache) {
    const n = graph.pages.length;
    const phrases = [];
    const byKey = new Map();
    const phraseOf = (stems) => {
        const key = stems.join(' ');
        let id = byKey.get(key);
        if (id === undefined) {
            id = phrases.length;
            phrases.push({ stems, names: [], prose: 0, linked: 0, linkedTo: new Map() });
            byKey.set(key, id);
        }
        return id;
    };
    const claim = (stems, target, kind, source = -1) => {
        if (stems.length === 0 || stems.length > MAX_NAME_WORDS)
            return;
        const phrase = phrases[phraseOf(stems)];
        let ref = phrase.names.find((r) => r.target === target && r.kind === kind);
        if (ref === undefined) {
            ref = { target, kind, users: kind === 'anchor-text' ? new Map() : null };
            phrase.names.push(ref);
        }
        if (ref.users !== null && source >= 0)
            ref.users.set(source, (ref.users.get(source) ?? 0) + 1);
    };
    for (const page of graph.pages) {
        claim(tokenize(page.title, cache), page.id, 'title');
        for (const route of [page.route, ...page.meta.aliases])
            claim(routeWords(route, cache), page.id, 'alias');
    }
    const contentLinks = [];
    for (const link of graph.links) {
        if (link.from < 0 || link.to < 0 || link.from === link.to)
            continue;
        const stems = tokenize(link.raw.text, cache);
        if (link.context === 'content') {
            claim(stems, link.to, 'anchor-text', link.from);
            contentLinks.push({ from: link.from, to: link.to, stems });
        }
        else {
            claim(stems, link.to, 'label');
        }
    }
    // The trie of unambiguous phrases.
    const root = { phrase: -1, next: new Map() };
    phrases.forEach((p, id) => {
        const targets = new Set(p.names.map((r) => r.target));
        if (targets.size === 0 || targets.size > MAX_PAGES_PER_NAME)
            return;
        let node = root;
        for (const stem of p.stems) {
            let child = node.next.get(stem);
            if (child === undefined) {
                child = { phrase: -1, next: new Map() };
                node.next.set(stem, child);
            }
            node = child;
        }
        node.phrase = id;
    });
    // Link texts: a whole-text match is a linked occurrence; a match inside a longer text is an
    // occurrence that is not a link (of that phrase).
    const linkMatches = Array.from({ length: n }, () => []);
    for (const link of contentLinks) {
        const exact = link.stems.length > 0 && link.stems.length <= MAX_NAME_WORDS ? byKey.get(link.stems.join(' ')) : undefined;
        if (exact !== undefined) {
            const p = phrases[exact];
            p.linked++;
            p.linkedTo.set(link.to, (p.linkedTo.get(link.to) ?? 0) + 1);
        }
        const joins = link.stems.map(() => true);
        scanStems(link.stems, joins, root, (phraseId, _first, words) => {
            const whole = words === link.stems.length;
            if (!whole)
                phrases[phraseId].prose++;
            linkMatches[link.from].push({ target: link.to, phrase: phraseId, exact: whole });
        });
    }
    const bySource = [];
    for (let s = 0; s < n; s++) {
        const facts = factsOf(s);
        const hits = new Map();
        bySource.push(hits);
        if (facts === undefined || facts.spans.length === 0)
            continue;
        const tokens = prepareSource(facts.spans, cache);
        scanStems(tokens.stem, tokens.joinNext, root, (phraseId, first, words) => {
            const phrase = phrases[phraseId];
            phrase.prose++;
            for (const ref of phrase.names) {
                if (ref.target === s)
                    continue;
                let hit = hits.get(ref.target);
                if (hit === undefined) {
                    hit = { count: 0, phrases: [], anchors: [], anchorPhrases: [] };
                    hits.set(ref.target, hit);
                }
                hit.count++;
                if (!hit.phrases.includes(phraseId))
                    hit.phrases.push(phraseId);
                keepAnchor(hit, tokens, phraseId, first, words);
            }
        });
    }
    for (const hits of bySource)
        for (const [t, hit] of hits)
            rankAnchors(hit, phrases, t);
    return { phrases, bySource, linkMatches };
}
const KIND_ORDER = ['anchor-text', 'title', 'label', 'alias'];
/**
 * Order a pair's anchor options the way an author would pick: the phrase most often written as
 * a link to this target where it occurs (links to the target / occurrences), then the kind of
 * name (another page's anchor text, the title, a navigation label, the route's words), then the
 * longer phrase, then the earlier place.
 */
function rankAnchors(hit, phrases, target) {
    const order = hit.anchors.map((_, k) => k);
    const odds = (k) => {
        const p = phrases[hit.anchorPhrases[k]];
        const total = p.prose + p.linked;
        return total === 0 ? 0 : (p.linkedTo.get(target) ?? 0) / total;
    };
    const kind = (k) => {
        const p = phrases[hit.anchorPhrases[k]];
        let best = KIND_ORDER.length;
        for (const r of p.names)
            if (r.target === target)
                best = Math.min(best, KIND_ORDER.indexOf(r.kind));
        return best;
    };
    order.sort((a, b) => odds(b) - odds(a) || kind(a) - kind(b) || hit.anchors[b].words - hit.anchors[a].words || hit.anchors[a].offset - hit.anchors[b].offset);
    const anchors = order.map((k) => hit.anchors[k]);
    const ids = order.map((k) => hit.anchorPhrases[k]);
    hit.anchors.splice(0, anchors.length, ...anchors);
    hit.anchorPhrases.splice(0, ids.length, ...ids);
}
/**
 * The phrases of a run of stems, left to right, each the longest that starts at its word; a
 * word inside a match starts no other (so "file system" is one mention, not also "file").
 */
function scanStems(stem, joinNext, root, visit) {
    for (let i = 0; i < stem.length;) {
        let node = root.next.get(stem[i]);
        let words = 1;
        let best = -1;
        let bestWords = 0;
        while (node !== undefined) {
            if (node.phrase >= 0) {
                best = node.phrase;
                bestWords = words;
            }
            if (words >= MAX_NAME_WORDS || !joinNext[i + words - 1])
                break;
            node = node.next.get(stem[i + words]);
            words++;
        }
        if (best >= 0) {
            visit(best, i, bestWords);
            i += bestWords;
        }
        else
            i++;
    }
}
/** Keep the mention as an anchor option if it is among the earliest that do not overlap; a longer match at the same start wins. */
function keepAnchor(hit, tokens, phrase, first, words) {
    const last = first + words - 1;
    const span = tokens.spans[tokens.span[first]];
    const start = tokens.start[first];
    const end = tokens.end[last];
    const offset = span.offset + start;
    const endOffset = span.offset + end;
    if (hit.anchorPhrases.includes(phrase))
        return;
    for (let k = 0; k < hit.anchors.length; k++) {
        const a = hit.anchors[k];
        if (offset < a.endOffset && a.offset < endOffset) {
            // Same place: keep the longer phrase.
            if (a.offset === offset && endOffset > a.endOffset) {
                hit.anchors[k] = match(span, start, end, offset, endOffset, words);
                hit.anchorPhrases[k] = phrase;
            }
            return;
        }
    }
    if (hit.anchors.length >= MENTIONS_KEPT)
        return;
    hit.anchors.push(match(span, start, end, offset, endOffset, words));
    hit.anchorPhrases.push(phrase);
}
function match(span, start, end, offset, endOffset, words) {
    const { line, column } = positionInSpan(span, start);
    return { offset, endOffset, line, column, text: span.text.slice(start, end), kind: 'name', words, quality: words };
}
/**
 * Whether a name of `target` in `phrase` stands for the pair (source, target) as if the pair's
 * own links were absent: anchor texts count only when another page uses them.
 */
export function nameKindsFor(phrase, source, target) {
    const kinds = [];
    for (const ref of phrase.names) {
        if (ref.target !== target)
            continue;
        if (ref.users !== null) {
            let others = 0;
            for (const [user, count] of ref.users)
                if (user !== source)
                    others += count;
            if (others === 0)
                continue;
        }
        kinds.push(ref.kind);
    }
    return kinds;
}
