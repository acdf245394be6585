import { z } from 'zod';
import type { Rule, RuleFinding } from './types.js';
import { pageFinding, parentPage } from './place.js';
import { entrySet, isOrphan } from './structure.js';

/** Options of `orphan-page`. */
export interface OrphanPageOptions {
  /**
   * Count template links (navigation, header, footer, repeated links) as inlinks.
   * `false`: a page only the sidebar links to is an orphan too.
   * @default true
   */
  readonly countTemplateLinks: boolean;
}

/**
 * `orphan-page`: every page has at least one inlink from another page.
 *
 * Entry pages are exempt. Reported at line 1, column 1 of the page's file. The message names
 * the nearest reachable page up the route (`/guide/` for `/guide/old/`) as the place to link
 * it from, when there is one.
 *
 * Options: `countTemplateLinks` (default `true`). Default level: `error`: nothing leads a
 * reader to an orphan page, so it is unreachable too.
 *
 * @example ok: `index.md` links to `about.md`, so `/about/` is no orphan.
 * @example not ok: nothing links to `old/notes.md`:
 * `old/notes.md:1:1  error  No page links to /old/notes/; link it from /`
 */
export const orphanPage: Rule<OrphanPageOptions> = {
  id: 'orphan-page',
  description: 'Every page is linked from at least one other page.',
  defaultSeverity: 'error',
  defaultOptions: { countTemplateLinks: true },
  optionsSchema: z.strictObject({ countTemplateLinks: z.boolean() }),
  check(ctx, options) {
    const entries = entrySet(ctx.graph);
    const findings: RuleFinding[] = [];
    for (const page of ctx.graph.pages) {
      if (!isOrphan(ctx.graph, ctx.ranking, entries, page.id, options.countTemplateLinks)) continue;
      const which = options.countTemplateLinks ? 'No page links' : 'No content link leads';
      const parent = parentPage(ctx, page.id);
      findings.push(pageFinding(page, `${which} to ${page.route}; link it from ${parent ?? 'a related page'}`));
    }
    return findings;
  },
};
