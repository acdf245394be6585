import { it } from 'vitest';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { suggestLinks } from '../../src/suggest/index.js';
import { markdownPage, siteInput, testOptions } from './helpers.js';
const root = join(import.meta.dirname, '..', 'fixtures', 'suggest-related');
function files(dir: string): string[] { return readdirSync(dir).flatMap((name) => { const p = join(dir, name); return statSync(p).isDirectory() ? files(p) : [p]; }).filter((p) => p.endsWith('.md')).sort(); }
it('dump', () => {
  for (const targets of ['underlinked', 'all'] as const) {
  const options = testOptions({ suggest: { targets } });
  const input = siteInput(files(root).map((p) => markdownPage(relative(root, p), readFileSync(p, 'utf8'))), options);
  const r = suggestLinks(input, options);
  if (targets === 'underlinked') for (const l of input.related) console.log(input.graph.pages[l.page]!.route, l.related.map((x) => `${input.graph.pages[x.page]!.route} ${x.similarity.toFixed(3)}`).join(', '));
  for (const s of r.suggestions) console.log(s.source, '->', s.target, JSON.stringify(s.anchor), s.similarity.toFixed(3), s.score.toFixed(3), s.reason);
  }
});
