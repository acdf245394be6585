/**
 * The SARIF fix proposes the markup `apply` writes: on the example site, every link `apply`
 * inserts in a dry run equals the inserted text of the SARIF fix of the same suggestion, given
 * the styles `apply` chose; HTML sources (where the two differed most) by a table below.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { applySuggestions } from '../../src/apply/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { suggestionLink, toSarif } from '../../src/report/index.js';
import type { LinkStyle } from '../../src/routes/index.js';
import { tempDir } from '../collect/tree.js';

const site = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'examples', 'docs-site');

describe('the SARIF fix and apply write one markup', () => {
  it('every applied link equals its SARIF fix text', async () => {
    const t = tempDir('linkweave-sarif-apply-');
    try {
      const config = JSON.parse(fs.readFileSync(path.join(site, 'linkweave.config.json'), 'utf8')) as Record<string, unknown>;
      const report = await analyze({ ...config, root: site, command: 'suggest', cache: { enabled: false, dir: path.join(t.dir, 'cache') } });
      const options = resolveOptions(config, site);
      const result = await applySuggestions({ options, report, selection: 'all', dryRun: true });
      const styles = new Map<string, LinkStyle>([...result.styles].map(([file, s]) => [file, s.style]));

      const fixes = new Map<string, string>();
      for (const r of toSarif(report, styles).runs[0]!.results!) {
        const text = r.fixes?.[0]?.artifactChanges[0]!.replacements[0]!.insertedContent?.text;
        if (text !== undefined) fixes.set(String(r.properties!['suggestionId']), text);
      }
      const written = result.applied.map((a) => [a.id, a.open + a.anchor + a.close]);
      expect(written.length).toBeGreaterThan(3);
      expect(written).toEqual(result.applied.map((a) => [a.id, fixes.get(a.id)]));
    } finally {
      t.cleanup();
    }
  });

  it('escapes & and " in an HTML href and follows the style', () => {
    const s = { id: 'x', source: '/old/a/', target: '/q&a/"quoted"/', file: 'old/a.html', anchor: 'questions' } as Parameters<typeof suggestionLink>[0];
    expect(suggestionLink(s, 'q&a/"quoted".md', 'absolute')).toBe('<a href="/q&amp;a/%22quoted%22/">questions</a>');
    expect(suggestionLink(s, 'q&a/"quoted".md', 'relative')).toBe('<a href="../../q&amp;a/%22quoted%22/">questions</a>');
    expect(suggestionLink({ ...s, file: 'old/a.md' }, 'q&a/"quoted".md', 'relative')).toBe('[questions](../q&a/%22quoted%22.md)');
    expect(suggestionLink({ ...s, file: 'old/a.md' }, 'q&a/"quoted".md', 'absolute')).toBe('[questions](/q&a/%22quoted%22/)');
  });
});
