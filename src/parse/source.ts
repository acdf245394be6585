/**
 * `parseSource`: one source file in, its `PageFacts` out. Never throws: any failure becomes a
 * problem on the page and whatever could be read is still returned, so one bad file never stops
 * a run.
 */
import GithubSlugger from 'github-slugger';
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, PageMeta, RawLink, SourceFile, SourceProblem } from '../types.js';
import { blankRegions, findHeavyRegions } from './assess.js';
import { scanHtml, scanMarkdownLines } from './fallback.js';
import { EMPTY_META, findFrontmatter, readFrontmatter } from './frontmatter.js';
import { walkHast } from './hast.js';
import type { LineIndex } from './lines.js';
import { buildLineIndex, lineOf, positionOf } from './lines.js';
import { readMarkdown } from './markdown.js';
import { addPatternLinks } from './patterns.js';
import { parseHtmlDocument } from './processors.js';
import { routeOfFile } from './routes.js';
import type { PageDraft } from './types.js';
import { newDraft } from './types.js';

/** A file read into a draft, with its frontmatter. */
export interface Read {
  readonly draft: PageDraft;
  readonly meta: PageMeta;
  readonly title?: string;
}

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
    const read = file.kind === 'html' ? readHtmlPage(src) : readMarkdownPage(src, lines);
    addPatternLinks(src, options.linkPatterns, read.draft);
    return assemble(file, options, bom, lines, read);
  } catch (error) {
    return failedFacts(file, options, bom, lines, error);
  }
}

/** The page with no links or text, and the failure as a problem. */
function failedFacts(file: SourceFile, options: ResolvedOptions, bom: number, lines: LineIndex | null, error: unknown): PageFacts {
  const message = `Unexpected failure while parsing (${describeError(error)}); the page is kept without links or text`;
  const draft = newDraft();
  draft.problems.push({ code: 'parse-failed', message });
  try {
    return assemble(file, options, bom, lines ?? buildLineIndex(''), { draft, meta: EMPTY_META });
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
      text: { title, headings: '', body: '' }, spans: [], problems: [...file.problems, { code: 'parse-failed', message }],
    };
  }
}

/**
 * Read a Markdown text into a draft: heavy regions to the simple scanner, the rest through
 * remark; a parser failure (a tree too deep for the stack) sends the whole text to the simple
 * scanner. Used for pages and for Markdown navigation files.
 * @param src Markdown source (BOM removed)
 * @param lines its line table
 */
export function readMarkdownPage(src: string, lines: LineIndex): Read {
  const draft = newDraft();
  const slugger = new GithubSlugger();
  const fmBlock = findFrontmatter(src);
  const bodyLine = fmBlock === null ? 0 : lineOf(lines, fmBlock.end) + 1;
  const heavy = findHeavyRegions(src, lines, bodyLine);
  let fm: { value: string; contentStart: number } | null;
  try {
    fm = readMarkdown(src, blankRegions(src, lines, heavy), lines, draft, slugger);
  } catch (error) {
    // A tree too deep for the stack, or a parser failure: read the whole page simply.
    const fresh = newDraft();
    const deep = error instanceof RangeError;
    fresh.problems.push({
      code: deep ? 'deep-nesting' : 'parse-failed',
      message: deep
        ? 'Unexpected nesting too deep to parse; the page is read with a simple scan (links and headings only, no places to insert links)'
        : `Unexpected failure of the Markdown parser (${describeError(error)}); the page is read with a simple scan`,
    });
    scanMarkdownLines(src, lines, bodyLine, lines.count, fresh, new GithubSlugger());
    return withFrontmatter(fresh, fmBlock === null ? null : { value: fmBlock.value, contentStart: fmBlock.contentStart });
  }
  for (const r of heavy) {
    draft.problems.push({ code: r.code, message: r.message, offset: lines.starts[r.from]! });
    scanMarkdownLines(src, lines, r.from, r.to, draft, slugger);
  }
  return withFrontmatter(draft, fm);
}

function readHtmlPage(src: string): Read {
  const draft = newDraft();
  const fmBlock = findFrontmatter(src);
  // Frontmatter (as some generators allow in HTML files) is blanked, not cut, so offsets hold.
  const html = fmBlock === null ? src : src.slice(0, fmBlock.end).replace(/[^\r\n]/g, ' ') + src.slice(fmBlock.end);
  if (fmBlock !== null) draft.code.push(0, fmBlock.end);
  try {
    walkHast(parseHtmlDocument(html), { src, draft, map: (o) => o, document: true });
  } catch (error) {
    const fresh = newDraft();
    const deep = error instanceof RangeError;
    fresh.problems.push({
      code: deep ? 'deep-nesting' : 'parse-failed',
      message: deep
        ? 'Unexpected element nesting too deep to parse; the page is read with a simple scan (links and headings only, no places to insert links)'
        : `Unexpected failure of the HTML parser (${describeError(error)}); the page is read with a simple scan`,
    });
    scanHtml(html, fresh);
    return withFrontmatter(fresh, fmBlock);
  }
  return withFrontmatter(draft, fmBlock);
}

function withFrontmatter(draft: PageDraft, fm: { value: string; contentStart: number } | null): Read {
  if (fm === null) return { draft, meta: EMPTY_META };
  const result = readFrontmatter(fm.value, fm.contentStart);
  draft.problems.push(...result.problems);
  return result.title === undefined ? { draft, meta: result.meta } : { draft, meta: result.meta, title: result.title };
}

function assemble(file: SourceFile, options: ResolvedOptions, bom: number, lines: LineIndex, read: Read): PageFacts {
  const { draft, meta } = read;
  const problems: SourceProblem[] = [...file.problems];
  const links = draft.links.slice().sort((a, b) => a.offset - b.offset);
  if (links.length > options.maxLinksPerPage) {
    const first = positionOf(lines, links[options.maxLinksPerPage]!.offset);
    draft.problems.push({
      code: 'too-many-links',
      message: `Unexpected ${links.length} links on one page, expected at most ${options.maxLinksPerPage} (maxLinksPerPage); links from line ${first.line} on are dropped`,
      offset: links[options.maxLinksPerPage]!.offset,
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
    return l.fileRelative === undefined ? link : { ...link, fileRelative: l.fileRelative };
  });
  const headings = draft.headings
    .slice()
    .sort((a, b) => a.offset - b.offset)
    .map((h) => ({ depth: h.depth, text: h.text, slug: h.slug, ...positionOf(lines, h.offset) }));
  const ids = new Set<string>(draft.ids);
  for (const h of headings) if (h.slug !== '') ids.add(h.slug);
  const spans = draft.spans
    .slice()
    .sort((a, b) => a.offset - b.offset)
    .map((s) => ({ text: s.text, offset: s.offset + bom, ...positionOf(lines, s.offset) }));
  const title = pickTitle(read.title, draft, file.path, options);
  const facts: PageFacts = {
    file: file.path,
    kind: file.kind,
    hash: file.hash,
    route: routeOfFile(file.path, meta, options.routes),
    title,
    meta,
    headings,
    ids: [...ids].sort(),
    links: rawLinks,
    text: { title, headings: headings.map((h) => h.text).join('\n'), body: draft.body.join('') },
    spans,
    problems,
  };
  return draft.baseHref === undefined ? facts : { ...facts, baseHref: draft.baseHref };
}

function pickTitle(fromFrontmatter: string | undefined, draft: PageDraft, path: string, options: ResolvedOptions): string {
  const t = fromFrontmatter?.trim();
  if (t !== undefined && t !== '') return t;
  if (draft.firstH1 !== undefined) return draft.firstH1;
  if (draft.htmlTitle !== undefined && draft.htmlTitle !== '') return draft.htmlTitle;
  const parts = path.split('/');
  const stem = parts[parts.length - 1]!.replace(/\.[^.]+$/, '');
  const isIndex = stem.toLowerCase() === 'index' || options.routes.indexNames.some((n) => n.toLowerCase() === stem.toLowerCase());
  return isIndex && parts.length > 1 ? parts[parts.length - 2]! : stem;
}

function describeError(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
