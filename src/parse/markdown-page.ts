/**
 * A Markdown text to a draft: the pre-scan sends heavy regions to the simple scanner and the rest
 * through remark; a parser failure (a tree too deep for the stack) sends the whole text to the
 * simple scanner. Used for pages and for Markdown navigation files.
 */
import GithubSlugger from 'github-slugger';
import type { HeavyRegion, LineRange } from './assess.js';
import { blankRegions, findHeavyRegions } from './assess.js';
import { scanMarkdownLines } from './fallback.js';
import { parserFailure } from './failure.js';
import { applyFrontmatter, findFrontmatter } from './frontmatter.js';
import type { LineIndex } from '../util/line-index.js';
import { lineContentEnd, lineOf, lineStart } from '../util/line-index.js';
import { readMarkdown } from './markdown.js';
import type { Read } from './types.js';
import { newDraft } from './types.js';

/**
 * MDX module blocks (a line starting with `import`/`export`, up to the next blank line, outside
 * code) are code, not prose: no spans, no text, no link patterns there.
 */
const MDX_ESM = /^(?:import|export)\s/;

/**
 * Read a Markdown text.
 * @param src Markdown source (BOM removed)
 * @param lines its line table
 * @param mdx true for `.mdx` files: top-level `import`/`export` lines are left out like code
 */
export function readMarkdownPage(src: string, lines: LineIndex, mdx = false): Read {
  const draft = newDraft();
  const slugger = new GithubSlugger();
  const fmBlock = findFrontmatter(src);
  const bodyLine = fmBlock === null ? 0 : lineOf(lines, fmBlock.end) + 1;
  const heavy = findHeavyRegions(src, lines, bodyLine);
  const esm = mdx ? esmLines(src, lines, bodyLine, heavy) : [];
  for (const r of esm) draft.code.push(lineStart(lines, r.from), lineContentEnd(lines, src, r.to - 1));
  let fm: { value: string; contentStart: number; format?: 'toml' } | null;
  try {
    const cut = [...heavy, ...esm].sort((a, b) => a.from - b.from);
    fm = readMarkdown(src, blankRegions(src, lines, cut), lines, draft, slugger);
  } catch (error) {
    const fresh = newDraft();
    fresh.problems.push(parserFailure('Markdown', error));
    if (fmBlock !== null) fresh.code.push(0, fmBlock.end);
    scanMarkdownLines(src, lines, bodyLine, lines.count, fresh, new GithubSlugger());
    return applyFrontmatter(fresh, fmBlock);
  }
  for (const r of heavy) {
    draft.problems.push({ code: r.code, message: r.message, offset: lineStart(lines, r.from) });
    scanMarkdownLines(src, lines, r.from, r.to, draft, slugger);
  }
  return applyFrontmatter(draft, fm);
}

/** Top-level ESM blocks of an MDX file (outside fenced code), as line ranges to leave out. */
function esmLines(src: string, lines: LineIndex, from: number, heavy: readonly HeavyRegion[]): LineRange[] {
  const out: LineRange[] = [];
  const skipped = new Set<number>();
  for (const r of heavy) for (let l = r.from; l < r.to; l++) skipped.add(l);
  const textOf = (l: number): string => src.slice(lineStart(lines, l), lineContentEnd(lines, src, l));
  let fence: string | null = null;
  for (let l = from; l < lines.count; l++) {
    if (skipped.has(l)) continue;
    const text = textOf(l);
    const mark = /^ {0,3}(`{3,}|~{3,})/.exec(text);
    if (mark !== null) {
      if (fence === null) fence = mark[1];
      else if (mark[1].startsWith(fence)) fence = null;
      continue;
    }
    if (fence !== null || !MDX_ESM.test(text)) continue;
    let to = l + 1;
    while (to < lines.count && !skipped.has(to) && textOf(to).trim() !== '') to++;
    out.push({ from: l, to });
    l = to - 1;
  }
  return out;
}
