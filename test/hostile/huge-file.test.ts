/**
 * Issue 7: a 50 MB Markdown file. Over `maxFileBytes` (default 10 MiB) it is skipped with a
 * finding and stays a page (its inlinks still resolve); with the limit raised it is processed
 * to its last line. Generated in a temp folder (never committed), in 1 MiB blocks.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cleanupAll, expectHealthyRest, findingsOf, healthy, project, run } from './helpers.js';

afterAll(cleanupAll);

const MIB = 1024 * 1024;

/**
 * Write `docs/huge.md`: a title, a paragraph of 50 lines of 1 MiB of prose (a link every 64
 * sentences), then a last paragraph. (Lines of 1 MiB rather than 80 characters: both go to the
 * simple scanner, but remark still walks the blanked lines, and 650,000 of them cost it seconds.)
 */
function writeHuge(root: string): { bytes: number; lastLine: number; bodyLinks: number } {
  const line = 'Plain words about lanterns, harbours and tides, repeated to fill the page up.';
  const linkLine = 'A line with [a link to the guide](guide.md) in the middle of the prose here.';
  const block: string[] = [];
  let blockLinks = 0;
  for (let size = 0, i = 0; size < MIB; i++) {
    const l = i % 64 === 0 ? linkLine : line;
    if (i % 64 === 0) blockLinks++;
    block.push(l);
    size += l.length + 1;
  }
  const blockText = `${block.join(' ')}\n`;
  const fd = fs.openSync(path.join(root, 'huge.md'), 'w');
  let bytes = fs.writeSync(fd, '# Huge\n\n');
  for (let i = 0; i < 50; i++) bytes += fs.writeSync(fd, blockText);
  const tail = '\nThe end: back [to the start page](index.md).\n';
  bytes += fs.writeSync(fd, tail);
  fs.closeSync(fd);
  // "# Huge", "", 50 lines, "", then the last line.
  return { bytes, lastLine: 2 + 50 + 2, bodyLinks: 50 * blockLinks };
}

describe('a 50 MB Markdown file', () => {
  it('is skipped over maxFileBytes with a finding, and processed to its last line when the limit is raised', async () => {
    const { root } = project(healthy('huge.md'));
    const huge = writeHuge(root);
    expect(huge.bytes).toBeGreaterThan(50 * MIB);

    // Default limit (10 MiB): a warning naming the file and its size; the page is still a page.
    // (It also gets a dead-end warning, as it has no outlinks that were read.)
    const skipped = await run(root);
    expect(findingsOf(skipped, 'huge.md').filter((f) => f.rule === 'source-problem')).toMatchObject([
      {
        rule: 'source-problem',
        severity: 'warning',
        target: 'too-large',
        line: 1,
        message: `file is ${huge.bytes} bytes, over maxFileBytes (${10 * MIB}); not analysed`,
      },
    ]);
    expect(skipped.pages.find((p) => p.file === 'huge.md')).toMatchObject({ route: '/huge/', depth: 1, inlinks: 1, outlinks: 0 });
    expect(skipped.links.filter((l) => l.file === 'huge.md')).toEqual([]);
    expect(skipped.links.find((l) => l.file === 'index.md' && l.to === '/huge/')).toMatchObject({ status: 'ok' });
    expectHealthyRest(skipped);

    // Limit raised: the file is read whole. Its one huge paragraph goes to the simple scanner
    // (too-complex), whose links are found, and the last paragraph is parsed in full.
    const read = await run(root, { maxFileBytes: 64 * MIB });
    expect(findingsOf(read, 'huge.md').map((f) => [f.target, f.line])).toEqual([['too-complex', 3]]);
    const links = read.links.filter((l) => l.file === 'huge.md');
    expect(links).toHaveLength(huge.bodyLinks + 1);
    expect(links[0]).toMatchObject({ to: '/guide/', line: 3, column: 13, status: 'ok' });
    expect(links.at(-1)).toMatchObject({ to: '/', text: 'to the start page', line: huge.lastLine, column: 15, status: 'ok' });
    expect(read.pages.find((p) => p.file === 'huge.md')).toMatchObject({ title: 'Huge', depth: 1, outlinks: 2 });
    expectHealthyRest(read);
  });
});
