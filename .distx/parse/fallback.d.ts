/**
 * The simple scanner: reads text the full parsers cannot take (see assess.ts, and trees deep
 * enough to exhaust the stack) so the page still counts. One pass per line, with regular
 * expressions whose character classes exclude their own openers, so no match scans past the next
 * bracket and a 10 MB line stays linear.
 *
 * It finds inline links, autolinks, `<a href>`, ATX headings, `id`/`name` attributes and body
 * text; it skips fenced code and backtick code; it gives no spans (it cannot be sure a place is
 * prose), no reference links and no template context.
 */
import type GithubSlugger from 'github-slugger';
import type { LineIndex } from './lines.js';
import type { PageDraft } from './types.js';
/**
 * Scan lines `[from, to)` of Markdown.
 * @param src the source text
 * @param lines its line table
 * @param from first 0-based line
 * @param to line after the last
 * @param draft the page being collected
 * @param slugger the page's slugger (heading slugs)
 */
export declare function scanMarkdownLines(src: string, lines: LineIndex, from: number, to: number, draft: PageDraft, slugger: GithubSlugger): void;
/**
 * Scan a whole HTML page (its tree was too deep to build): links, ids, title, headings, text.
 * @param src the source text
 * @param draft the page being collected
 */
export declare function scanHtml(src: string, draft: PageDraft): void;
