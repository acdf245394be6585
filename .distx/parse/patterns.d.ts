/**
 * Link patterns (DESIGN section 3): shortcodes or macros such as `{{ref "a/b.md"}}` that a site
 * generator turns into links. Each configured regular expression runs over the raw source
 * outside code (fenced and inline code, `<code>`/`<pre>`, frontmatter); each match becomes a
 * link at the match's position whose destination is the route template with `$1`..`$9`
 * replaced by the capture groups.
 *
 * Link text: the named group `text` (or `name`) when the pattern has one, else the whole match.
 */
import type { ResolvedOptions } from '../options.js';
import type { PageDraft } from './types.js';
/**
 * Add the links the configured patterns produce.
 * @param src the source text
 * @param patterns `options.linkPatterns`
 * @param draft the page being collected (its `code` ranges are honoured)
 */
export declare function addPatternLinks(src: string, patterns: ResolvedOptions['linkPatterns'], draft: PageDraft): void;
