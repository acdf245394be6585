/**
 * `parseSource`: one source file in, its `PageFacts` out. Never throws: any failure becomes a
 * problem on the page and whatever could be read is still returned, so one bad file never stops
 * a run.
 */
import type { ResolvedOptions } from '../config/options.js';
import type { Heading, CodeSpan, IncludeRef, PageFacts, ProtectedRegion, RawLink, SourceFile, SourceProblem } from '../types.js';
import { findIncludes } from './includes.js';
import { describeError } from './failure.js';
import { EMPTY_META } from './frontmatter.js';
import { readHtmlPage } from './html.js';
import type { LineIndex } from '../util/line-index.js';
import { buildLineIndex, positionOf } from '../util/line-index.js';
import { readMarkdownPage } from './markdown-page.js';
import { addPatternLinks } from './patterns.js';
import { protectDraft } from './protect.js';
import { routeOfFile } from '../routes/index.js';
import type { PageDraft, Read } from './types.js';
import { newDraft } from './types.js';

/**
 * Parse one source file: route, title, frontmatter, headings and ids, links with positions,
 * text for the term index, and spans where links may be inserted.
 * @param file the file as `collect` read it (text decoded, BOM removed; a leading BOM that is
 *   still there is skipped, and offsets still index `file.text`)
 * @param options resolved options (`routes`, `linkPatterns`, `maxLinksPerPage` are read)
 */
export function parseSource(file: SourceFile, options: ResolvedOptions): PageFacts {
  const bom = file.text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const src = bom === 1 ? file.text.slice(1) : file.text;
  let lines: LineIndex | null = null;
  try {
    lines = buildLineIndex(src);
    const mdx = /\.mdx$/i.test(file.path);
    const read = file.kind === 'html' ? readHtmlPage(src) : readMarkdownPage(src, lines, mdx);
    addPatternLinks(src, options.linkPatterns, read.draft);
    const regions = protectDraft({ src, lines, kind: file.kind, mdx }, read.draft);
    dropInCodeBodies(read.draft);
    if (file.kind === 'markdown') addBlockAttributeIds(src, read.draft);
    return assemble(file, options, bom, lines, read, regions);
  } catch (error) {
    return failedFacts(file, options, bom, lines, error);
  }
}

/**
 * Links and headings the Markdown parser found in template text the generator shows as code
 * (`draft.codeBodies`) are not the page's: the reader sees them as text.
 */
function dropInCodeBodies(draft: PageDraft): void {
  const bodies = draft.codeBodies;
  if (bodies.length === 0) return;
  const inside = (offset: number): boolean => {
    for (let i = 0; i + 1 < bodies.length; i += 2) if (offset >= bodies[i] && offset < bodies[i + 1]) return true;
    return false;
  };
  const links = draft.links.filter((l) => !inside(l.offset));
  draft.links.length = 0;
  draft.links.push(...links);
  const headings = draft.headings.filter((h) => !inside(h.offset));
  draft.headings.length = 0;
  draft.headings.push(...headings);
}

/**
 * kramdown's block attribute list on a line of its own (`{: #v1-0-0}` under a heading) gives the
 * block before it that id (kramdown syntax, "Block Inline Attribute Lists"; checked with
 * jekyll 4.3 on Jekyll's own docs: `## 1.0.0 / 2013-05-06` then `{: #v1-0-0}` is
 * `<h2 id="v1-0-0">`). The id is the page's whatever the block; lines in code are skipped.
 */
function addBlockAttributeIds(src: string, draft: PageDraft): void {
  if (!src.includes('{:')) return;
  const code = draft.code;
  const re = /^[ \t]{0,3}\{:[ \t]*#([A-Za-z][\w:.-]*)(?=[\s}])[^}\n]*\}[ \t]*$/gm;
  for (let m = re.exec(src); m !== null; m = re.exec(src)) {
    let inCode = false;
    for (let i = 0; i + 1 < code.length && !inCode; i += 2) if (m.index >= code[i] && m.index < code[i + 1]) inCode = true;
    if (!inCode && !draft.ids.includes(m[1])) draft.ids.push(m[1]);
  }
}

/** The page with no links or text, and the failure as a problem. */
function failedFacts(file: SourceFile, options: ResolvedOptions, bom: number, lines: LineIndex | null, error: unknown): PageFacts {
  const message = `The page could not be parsed (${describeError(error)}); it is kept without links or text`;
  const draft = newDraft();
  draft.problems.push({ code: 'parse-failed', message });
  try {
    return assemble(file, options, bom, lines ?? buildLineIndex(''), { draft, meta: EMPTY_META }, []);
  } catch {
    let route: string;
    try {
      route = routeOfFile(file.path, EMPTY_META, options.routes);
    } catch {
      route = `/${file.path}`;
    }
    const title = file.path;
    return {
      file: file.path, kind: file.kind, hash: file.hash, route, title, meta: EMPTY_META, headings: [], ids: [], links: [],
      text: { title, headings: '', body: '' }, spans: [], protected: [], problems: [...file.problems, { code: 'parse-failed', message }],
    };
  }
}

function assemble(
  file: SourceFile,
  options: ResolvedOptions,
  bom: number,
  lines: LineIndex,
  read: Read,
  regions: readonly ProtectedRegion[],
): PageFacts {
  const { draft, meta } = read;
  const problems: SourceProblem[] = [...file.problems];
  const links = draft.links.slice().sort((a, b) => a.offset - b.offset);
  if (links.length > options.maxLinksPerPage) {
    const first = positionOf(lines, links[options.maxLinksPerPage].offset);
    draft.problems.push({
      code: 'too-many-links',
      message: `${links.length} links on one page, more than maxLinksPerPage (${options.maxLinksPerPage}); links from line ${first.line} on are dropped`,
      offset: links[options.maxLinksPerPage].offset,
    });
    links.length = options.maxLinksPerPage;
  }
  const drafted = draft.problems.map((p) => {
    if (p.offset === undefined) return { code: p.code, message: p.message };
    const at = positionOf(lines, p.offset);
    return { code: p.code, message: p.message, line: at.line, column: at.column };
  });
  drafted.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
  problems.push(...drafted);

  const rawLinks: RawLink[] = links.map((l) => {
    const at = positionOf(lines, l.offset);
    const link: RawLink = { href: l.href, text: l.text, line: at.line, column: at.column, context: l.context, nofollow: l.nofollow, origin: l.origin };
    return l.fileRelative === undefined && l.code === undefined ? link : { ...link, ...(l.fileRelative === undefined ? {} : { fileRelative: l.fileRelative }), ...(l.code === undefined ? {} : { code: l.code }) };
  });
  const headings = draft.headings
    .slice()
    .sort((a, b) => a.offset - b.offset)
    .map((h) => {
      const heading: Heading = { depth: h.depth, text: h.text, slug: h.slug, ...positionOf(lines, h.offset) };
      if (h.explicit === true) return { ...heading, explicit: true as const };
      return h.raw === undefined ? heading : { ...heading, raw: h.raw };
    });
  const ids = new Set<string>(draft.ids);
  for (const h of headings) if (h.slug !== '') ids.add(h.slug);
  // Ids a heading-id style makes are told apart from the ones written in the source.
  const styled = file.kind === 'markdown' && headings.some((h) => h.explicit !== true);
  const fixedIds = new Set<string>(draft.ids);
  if (styled) for (const h of headings) if (h.explicit === true && h.slug !== '') fixedIds.add(h.slug);
  const includes = findIncludes(bom === 1 ? file.text.slice(1) : file.text, file.path, draft.code, lines);
  const spans = draft.spans
    .slice()
    .sort((a, b) => a.offset - b.offset)
    .map((s) => ({ text: s.text, offset: s.offset + bom, ...positionOf(lines, s.offset) }));
  // A code span may be an anchor only where it is exactly one code region (none held by or
  // merged into another), so `apply` can wrap it whole.
  const codeRegions = new Set<string>();
  for (const r of regions) if (r[2] === 'code') codeRegions.add(`${r[0]}:${r[1]}`);
  const codeSpans = draft.codeSpans
    .filter((c) => codeRegions.has(`${c.offset}:${c.end}`))
    .sort((a, b) => a.offset - b.offset)
    .map((c): CodeSpan => ({ text: c.text, code: c.code, offset: c.offset + bom, endOffset: c.end + bom, ...positionOf(lines, c.offset) }));
  const title = pickTitle(read.title, draft, file.path, options);
  const facts: PageFacts = {
    file: file.path,
    kind: file.kind,
    hash: file.hash,
    route: routeOfFile(file.path, read.title === undefined ? meta : { ...meta, title: read.title }, options.routes),
    title,
    meta,
    headings,
    ids: [...ids].sort(),
    links: rawLinks,
    text: { title, headings: headings.map((h) => h.text).join('\n'), body: draft.body.join('') },
    spans,
    protected: bom === 0 ? regions : regions.map((r): ProtectedRegion => [r[0] + bom, r[1] + bom, r[2]]),
    problems,
  };
  const extra: { fixedIds?: string[]; includes?: IncludeRef[]; baseHref?: string; codeSpans?: CodeSpan[] } = {};
  if (codeSpans.length > 0) extra.codeSpans = codeSpans;
  if (styled) extra.fixedIds = [...fixedIds].sort();
  if (includes.length > 0) extra.includes = includes;
  if (draft.baseHref !== undefined) extra.baseHref = draft.baseHref;
  return Object.keys(extra).length === 0 ? facts : { ...facts, ...extra };
}

function pickTitle(fromFrontmatter: string | undefined, draft: PageDraft, path: string, options: ResolvedOptions): string {
  const t = fromFrontmatter?.trim();
  if (t !== undefined && t !== '') return t;
  if (draft.firstH1 !== undefined) return draft.firstH1;
  if (draft.htmlTitle !== undefined && draft.htmlTitle !== '') return draft.htmlTitle;
  const parts = path.split('/');
  const stem = parts[parts.length - 1].replace(/\.[^.]+$/, '');
  const isIndex = stem.toLowerCase() === 'index' || options.routes.indexNames.some((n) => n.toLowerCase() === stem.toLowerCase());
  return isIndex && parts.length > 1 ? parts[parts.length - 2] : stem;
}
