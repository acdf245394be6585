/**
 * The names of a target page an anchor may match (see `anchor.ts`): its title, its aliases (the
 * words of the last segment of its route and of its frontmatter aliases) and its key terms, as
 * Porter stems.
 */
import { tokenize } from '../text/tokenize.js';
/** Stems of the words of the last segment of a route or alias (`/guide/cache-server/` -> cach, server). */
export function routeWords(route, cache) {
    const segments = route.split('/').filter((s) => s !== '');
    const last = segments[segments.length - 1];
    if (last === undefined)
        return [];
    let decoded = last;
    try {
        decoded = decodeURIComponent(last);
    }
    catch {
        // keep the segment as written
    }
    return tokenize(decoded.replace(/\.(?:html?|md|markdown|mdx)$/i, '').replace(/[-_.+~]+/g, ' '), cache);
}
/**
 * The names of a target page.
 * @param keyTerms the target's key terms; in a plain list every term counts as strong
 * @param df document frequency of a stem (0 when the index does not know it)
 */
export function targetNames(title, routes, keyTerms, cache, df = () => 0) {
    const name = (stems) => {
        let min = Infinity;
        for (const s of stems)
            min = Math.min(min, df(s));
        return { stems, rarest: new Set(stems.filter((s) => df(s) === min)) };
    };
    const titleStems = tokenize(title, cache);
    const seen = new Set([titleStems.join(' ')]);
    const aliases = [];
    for (const route of routes) {
        const words = routeWords(route, cache);
        const key = words.join(' ');
        if (words.length === 0 || seen.has(key))
            continue;
        seen.add(key);
        aliases.push(name(words));
    }
    const keys = Array.isArray(keyTerms) ? { all: keyTerms, strong: keyTerms } : keyTerms;
    const nameWords = new Set([...titleStems, ...aliases.flatMap((a) => a.stems)]);
    return { title: name(titleStems), aliases, keyTerms: new Set(keys.all), strongTerms: new Set(keys.strong), nameWords };
}
