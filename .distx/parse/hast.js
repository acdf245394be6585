import { addHtmlTextSpans, collapseSpace, looksLikeUrl } from './spans.js';
const TEMPLATE = 1;
const IN_LINK = 2;
const NO_BODY = 4;
const SPAN_OK = 8;
const NO_SPAN = 16;
const IN_SVG = 32;
const TEMPLATE_TAGS = new Set(['nav', 'header', 'footer', 'aside']);
const SPAN_TAGS = new Set(['p', 'li', 'td', 'dd']);
const CODE_TAGS = new Set(['code', 'pre', 'kbd', 'samp', 'var']);
const SKIP_TAGS = new Set(['script', 'style', 'template', 'noscript', 'textarea', 'iframe', 'object']);
const NO_SPAN_TAGS = new Set(['button', 'select', 'option', 'label', 'sup', 'sub', 'abbr']);
const BLOCK_TAGS = new Set([
    'p', 'li', 'td', 'th', 'dd', 'dt', 'div', 'section', 'article', 'main', 'blockquote', 'br', 'tr',
    'figcaption', 'caption', 'ul', 'ol', 'dl', 'table', 'hr', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6',
]);
const HEADING = /^h([1-6])$/;
/**
 * Walk a hast tree and add what it holds to the draft.
 * @param root the tree
 * @param ctx the page and the offset mapping
 * @param template true when the tree sits inside a template region already
 */
export function walkHast(root, ctx, template = false) {
    const before = ctx.draft.links.length;
    const flags = template ? TEMPLATE | NO_BODY | NO_SPAN : 0;
    const walk = { ...ctx, seen: new Set() };
    for (const child of root.children)
        visit(child, walk, flags);
    return { links: ctx.draft.links.length - before };
}
function visit(node, ctx, flags) {
    if (node.type === 'text') {
        if (!ctx.document)
            return;
        if ((flags & NO_BODY) === 0)
            ctx.draft.body.push(node.value);
        if ((flags & SPAN_OK) !== 0 && (flags & (NO_SPAN | IN_LINK | TEMPLATE)) === 0 && node.position) {
            const start = node.position.start.offset;
            const end = node.position.end.offset;
            if (start !== undefined && end !== undefined)
                addHtmlTextSpans(ctx.draft, ctx.src, node.value, ctx.map(start), ctx.map(end));
        }
        return;
    }
    if (node.type !== 'element')
        return;
    const tag = node.tagName;
    const props = node.properties;
    const start = ctx.map(node.position?.start.offset ?? 0);
    const draft = ctx.draft;
    if (typeof props.id === 'string' && props.id !== '')
        draft.ids.push(props.id);
    if (tag === 'a' && typeof props.name === 'string' && props.name !== '')
        draft.ids.push(props.name);
    if (SKIP_TAGS.has(tag)) {
        // Raw text (scripts, styles): no links, no prose, no link patterns.
        const end = node.position?.end.offset;
        if (end !== undefined)
            draft.code.push(start, ctx.map(end));
        return;
    }
    let f = flags;
    if ((tag === 'a' || tag === 'area') && props.href !== undefined && props.href !== null && node.position !== undefined && !ctx.seen.has(start)) {
        ctx.seen.add(start);
        const href = String(props.href);
        // An area has no content: its alt text is what it says.
        const text = collapseSpace(tag === 'area' ? (typeof props.alt === 'string' ? props.alt : '') : plainText(node));
        const rel = props.rel;
        const nofollow = Array.isArray(rel) ? rel.some((r) => String(r).toLowerCase() === 'nofollow') : typeof rel === 'string' && /(?:^|\s)nofollow(?:\s|$)/i.test(rel);
        draft.links.push({ offset: start, href, text, context: (flags & TEMPLATE) !== 0 ? 'template' : 'content', nofollow, origin: 'html' });
        f |= IN_LINK;
        if (looksLikeUrl(text, href))
            f |= NO_BODY;
    }
    if (TEMPLATE_TAGS.has(tag))
        f |= TEMPLATE | NO_BODY | NO_SPAN;
    if (CODE_TAGS.has(tag)) {
        f |= NO_BODY | NO_SPAN;
        const end = node.position?.end.offset;
        if (end !== undefined)
            draft.code.push(start, ctx.map(end));
    }
    if (NO_SPAN_TAGS.has(tag))
        f |= NO_SPAN;
    if (SPAN_TAGS.has(tag))
        f |= SPAN_OK;
    if (tag === 'svg')
        f |= IN_SVG | NO_BODY | NO_SPAN;
    if (ctx.document) {
        if (tag === 'base') {
            if (draft.baseHref === undefined && typeof props.href === 'string')
                draft.baseHref = props.href;
            return;
        }
        if (tag === 'title' && (flags & IN_SVG) === 0) {
            if (draft.htmlTitle === undefined)
                draft.htmlTitle = collapseSpace(plainText(node));
            return;
        }
        const h = HEADING.exec(tag);
        // A heading in a template region (the site name in a header) is not the page's.
        if (h !== null && (flags & TEMPLATE) === 0) {
            const text = collapseSpace(plainText(node));
            const depth = Number(h[1]);
            draft.headings.push({ depth, text, slug: typeof props.id === 'string' ? props.id : '', offset: start });
            if (depth === 1 && draft.firstH1 === undefined && text !== '')
                draft.firstH1 = text;
            f |= NO_BODY | NO_SPAN;
        }
    }
    for (const child of node.children)
        visit(child, ctx, f);
    if (ctx.document && (f & NO_BODY) === 0 && BLOCK_TAGS.has(tag))
        draft.body.push('\n');
}
/**
 * Plain text of an element: its text nodes, and `alt` of images, in document order (script and
 * style content left out).
 * @param node a hast element
 */
export function plainText(node) {
    let out = '';
    for (const child of node.children) {
        if (child.type === 'text')
            out += child.value;
        else if (child.type === 'element' && !SKIP_TAGS.has(child.tagName)) {
            if (child.tagName === 'img' && typeof child.properties.alt === 'string')
                out += child.properties.alt;
            else
                out += plainText(child);
        }
    }
    return out;
}
