/**
 * Issue 7, "determinism with 1 or more worker threads", for bad files: the problems, positions
 * and dropped links of hostile files come out the same from worker threads as from the main
 * thread. (test/parallel/parse-files.test.ts checks the same on a large clean site.)
 * `workers: 2` starts the pool whatever the file count (src/parallel/plan.ts, chooseThreads);
 * the workers run the compiled worker in dist/ (built by the vitest global setup).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { AnalyzeHooks } from '../../src/analyze.js';
import type { ParseHooks, ParseStats } from '../../src/parallel/index.js';
import { allFormats, cleanupAll, healthy, project } from './helpers.js';

afterAll(cleanupAll);

const bytes = (...parts: (string | number[])[]) =>
  Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'utf8') : Buffer.from(p))));

describe('hostile files parsed in worker threads', () => {
  it('workers: 1 and workers: 2 give byte-identical reports in every format', async () => {
    const { root } = project({
      ...healthy('utf8.md'),
      'docs/utf8.md': bytes('# Caf', [0xe9], '\n\n[home](index.md)\n'),
      'docs/yaml.md': '---\ntitle: [bad\n---\n# Yaml\n\n[guide](guide.md)\n',
      'docs/bom.md': bytes([0xef, 0xbb, 0xbf], '[guide](guide.md)\r\n[gone](gone.md)\r'),
      'docs/quotes.md': Array.from({ length: 1000 }, (_, i) => `${'>'.repeat(i + 1)} [q](index.md)`).join('\n'),
      'docs/many.html': `<title>Many</title>\n${Array.from({ length: 25_000 }, (_, i) => `<a href=guide.md>g${i}</a>`).join('\n')}`,
      'docs/malformed.html': '<p>Open <a href="index.md">home <b>bold</p><div><a href=guide.md>guide</a></html',
      'docs/binary.md': bytes([0x89, 0x50, 0x4e, 0x47, 0, 0, 1]),
      'docs/empty.md': '',
    });
    const outputs: Record<string, string>[] = [];
    for (const workers of [1, 2]) {
      let stats: ParseStats | undefined;
      const hooks: AnalyzeHooks & ParseHooks = { onParseStats: (s) => (stats = s) };
      const report = await analyze({ root, workers, cache: { enabled: false } }, hooks);
      expect(stats!.workers).toMatchObject({ threads: workers, fallback: null });
      outputs.push(allFormats(report));
      const codes = report.findings.filter((f) => f.rule === 'source-problem').map((f) => [f.file, f.target]);
      expect(codes).toEqual([
        ['binary.md', 'binary'],
        ['many.html', 'too-many-links'],
        ['quotes.md', 'deep-nesting'],
        ['utf8.md', 'invalid-utf8'],
        ['yaml.md', 'frontmatter'],
      ]);
    }
    expect(outputs[1]).toEqual(outputs[0]);
  });
});
