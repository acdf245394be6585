/**
 * Helpers of the hostile-input tests (issue 7): sites written to temp folders, `analyze` with
 * the cache off (these tests must not leave cache files in the working folder), and the checks
 * every case shares ("the rest of the site is analysed").
 */
import path from 'node:path';
import { expect } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { AnalyzeInput } from '../../src/analyze.js';
import { FORMAT_IDS, formatReport } from '../../src/report/index.js';
import type { Finding, Report } from '../../src/types.js';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Tree } from '../collect/tree.js';

export { tempDir, writeTree };
export type { Tree };

/** Removes what a test created; call `cleanupAll` in `afterEach`. */
const cleanups: (() => void)[] = [];

/** Run and forget every cleanup registered so far. */
export function cleanupAll(): void {
  while (cleanups.length > 0) cleanups.pop()!();
}

/** A fresh temp folder, removed after the test. */
export function scratch(prefix = 'linkweave-hostile-'): string {
  const t = tempDir(prefix);
  cleanups.push(t.cleanup);
  return t.dir;
}

/** A project folder holding the site under `docs/` (so files can sit beside the content root). */
export function project(tree: Tree): { dir: string; root: string } {
  const dir = scratch();
  writeTree(dir, tree);
  return { dir, root: path.join(dir, 'docs') };
}

/**
 * Three healthy pages that link to each other and to the page under test (`bad`), under
 * `docs/`. The hostile file is added by each test; these pages must come out analysed.
 */
export function healthy(bad: string): Tree {
  return {
    'docs/index.md': `# Home\n\nStart with [the guide](guide.md), the [reference](reference.md) and [the odd page](${bad}).\n`,
    // Link texts differ page to page: a link repeated on half the pages would be a template link.
    'docs/guide.md': '# Guide\n\nSee [the reference pages](reference.md) or go [back home](index.md).\n',
    'docs/reference.md': '# Reference\n\nBack to [the guide to it all](guide.md) and [the start page](index.md).\n',
  };
}

/** `analyze` with the cache off (one worker thread unless the config says otherwise). */
export function run(root: string, config: Omit<AnalyzeInput, 'root'> = {}): Promise<Report> {
  return analyze({ workers: 1, ...config, root, cache: { enabled: false } });
}

/** Findings of one file. */
export function findingsOf(report: Report, file: string): Finding[] {
  return report.findings.filter((f) => f.file === file);
}

/**
 * The healthy pages of `healthy()` were analysed: each is a page, reachable, with PageRank,
 * and the links between them resolved `ok` at their lines.
 */
export function expectHealthyRest(report: Report): void {
  for (const file of ['index.md', 'guide.md', 'reference.md']) {
    const page = report.pages.find((p) => p.file === file);
    expect(page, `page ${file}`).toBeDefined();
    expect(page!.pagerank).toBeGreaterThan(0);
    expect(page!.depth).not.toBeNull();
    expect(page!.inlinks).toBeGreaterThanOrEqual(2);
  }
  const ok = (file: string) => report.links.filter((l) => l.file === file && l.status === 'ok').map((l) => l.to);
  expect(ok('guide.md')).toEqual(['/reference/', '/']);
  expect(ok('reference.md')).toEqual(['/guide/', '/']);
  expect(ok('index.md')).toEqual(expect.arrayContaining(['/guide/', '/reference/']));
  // No finding on the healthy pages other than what their own content gives (none).
  for (const file of ['guide.md', 'reference.md']) expect(findingsOf(report, file)).toEqual([]);
  const sum = report.pages.reduce((s, p) => s + p.pagerank, 0);
  expect(sum).toBeCloseTo(1, 6);
}

/** The report in every output format, by id. */
export function allFormats(report: Report): Record<string, string> {
  return Object.fromEntries(FORMAT_IDS.map((id) => [id, formatReport(report, id)]));
}
