/**
 * HTML pages: one rehype-parse (parse5) run, one walk (hast.ts). Frontmatter at the top, which
 * some generators allow in HTML files, is read and blanked (replaced by spaces, line endings
 * kept) so offsets stay those of the file. A tree too deep for the stack sends the page to the
 * simple scanner.
 */
import { scanHtml } from './fallback.js';
import { parserFailure } from './failure.js';
import { applyFrontmatter, findFrontmatter } from './frontmatter.js';
import { walkHast } from './hast.js';
import { parseHtmlDocument } from './processors.js';
import { newDraft } from './types.js';
/**
 * Read an HTML page.
 * @param src HTML source (BOM removed)
 */
export function readHtmlPage(src) {
    const draft = newDraft();
    const fm = findFrontmatter(src);
    const html = fm === null ? src : src.slice(0, fm.end).replace(/[^\r\n]/g, ' ') + src.slice(fm.end);
    if (fm !== null)
        draft.code.push(0, fm.end);
    try {
        walkHast(parseHtmlDocument(html), { src, draft, map: (o) => o, document: true });
    }
    catch (error) {
        const fresh = newDraft();
        fresh.problems.push(parserFailure('HTML', error));
        if (fm !== null)
            fresh.code.push(0, fm.end);
        scanHtml(html, fresh);
        return applyFrontmatter(fresh, fm);
    }
    return applyFrontmatter(draft, fm);
}
