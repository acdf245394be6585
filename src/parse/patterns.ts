/**
 * Link patterns (DESIGN section 3): shortcodes or macros such as `{{ref "a/b.md"}}` that a site
 * generator turns into links. Each configured regular expression runs over the raw source
 * outside code (fenced and inline code, `<code>`/`<pre>`, frontmatter); each match becomes a
 * link at the match's position whose destination is the route template with `$1`..`$9`
 * replaced by the capture groups.
 *
 * Link text: the named group `text` (or `name`) when the pattern has one, else the whole match.
 */
import type { ResolvedOptions } from '../config/options.js';
import { hasSourceExtension } from '../routes/index.js';
import type { PageDraft } from './types.js';

/**
 * Add the links the configured patterns produce.
 * @param src the source text
 * @param patterns `options.linkPatterns`
 * @param draft the page being collected (its `code` ranges are honoured)
 */
export function addPatternLinks(src: string, patterns: ResolvedOptions['linkPatterns'], draft: PageDraft): void {
  if (patterns.length === 0) return;
  const ranges = sortedRanges(draft.code);
  for (const [index, p] of patterns.entries()) {
    let re: RegExp;
    try {
      re = new RegExp(p.pattern, 'g');
    } catch (error) {
      draft.problems.push({ code: 'bad-link-pattern', message: `linkPatterns.${index}.pattern is not a valid regular expression (${(error as Error).message}); the pattern is skipped` });
      continue;
    }
    let r = 0;
    let maxEnd = -1;
    for (let m = re.exec(src); m !== null; m = re.exec(src)) {
      if (m[0] === '') {
        re.lastIndex++;
        continue;
      }
      const at = m.index;
      while (r < ranges.length && ranges[r][0] <= at) {
        maxEnd = Math.max(maxEnd, ranges[r][1]);
        r++;
      }
      if (maxEnd > at) continue;
      const groups = m;
      const href = p.route.replace(/\$([1-9])/g, (_s, d: string) => groups[Number(d)] ?? '');
      const text = m.groups?.text ?? m.groups?.name ?? m[0];
      draft.links.push({
        offset: at,
        href,
        text,
        context: 'content',
        nofollow: false,
        origin: 'pattern',
        fileRelative: hasSourceExtension(href),
      });
    }
  }
}

/** `[start, end)` pairs sorted by start. */
function sortedRanges(code: readonly number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < code.length; i += 2) out.push([code[i], code[i + 1]]);
  out.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  return out;
}
