import { z } from 'zod';
import type { Rule, RuleFinding } from './types.js';
import { pageFinding } from './place.js';
import { isDeadEnd } from './structure.js';

/** Options of `dead-end`. */
export interface DeadEndOptions {
  /**
   * Count template links (navigation, header, footer) as outlinks. With the default `false`, a
   * page whose only links are the sidebar's is a dead end: the reader finishes the text and finds
   * nowhere to go on but the menu, which every page has.
   * @default false
   */
  readonly countTemplateLinks: boolean;
}

/**
 * `dead-end`: every page links on to at least one other page, so a reader never has to go back.
 *
 * Links to external sites, files and the page itself do not count. A one-page site has no
 * dead ends. Reported at line 1, column 1 of the page's file.
 *
 * Options: `countTemplateLinks` (default `false`). Default level: `warning`.
 *
 * @example ok: `/guide/install/` ends with "Next: [configure](configure.md)".
 * @example not ok: `/guide/faq/` links only to an external site:
 * `guide/faq.md:1:1  warning  Dead end: /guide/faq/ has no content links to other pages; add a
 * link onward`
 */
/** Problems after which a page's links were never read. */
const UNREAD: ReadonlySet<string> = new Set(['too-large', 'binary', 'unreadable']);

export const deadEnd: Rule<DeadEndOptions> = {
  id: 'dead-end',
  description: 'Every page links on to at least one other page.',
  defaultSeverity: 'warning',
  defaultOptions: { countTemplateLinks: false },
  optionsSchema: z.strictObject({ countTemplateLinks: z.boolean() }),
  check(ctx, options) {
    const findings: RuleFinding[] = [];
    const which = options.countTemplateLinks ? 'links' : 'content links';
    for (const page of ctx.graph.pages) {
      // A file that was never read (too large, binary, unreadable) has no links to judge:
      // source-problem already reports it.
      if (ctx.facts[page.factsIndex]?.problems.some((p) => UNREAD.has(p.code))) continue;
      if (!isDeadEnd(ctx.graph, ctx.ranking, page.id, options.countTemplateLinks)) continue;
      findings.push(
        pageFinding(page, `Dead end: ${page.route} has no ${which} to other pages; add a link onward`),
      );
    }
    return findings;
  },
};
