/**
 * The unified plugin in a real remark pipeline (unified + remark-parse + remark-frontmatter)
 * over a fixture site on disk: the collector's report equals `analyze` on the same folder, and
 * the findings come back as vfile messages that vfile-reporter prints.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkParse from 'remark-parse';
import { glob } from 'tinyglobby';
import { unified } from 'unified';
import { VFile } from 'vfile';
import { reporter } from 'vfile-reporter';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { isEngineError } from '../../src/errors.js';
import { createCollector, linkweaveCollect, linkweaveReport, MESSAGE_SOURCE } from '../../src/plugins/unified.js';
import type { Report } from '../../src/types.js';

const site = path.resolve(import.meta.dirname, '../fixtures/unified-site');
const expected = JSON.parse(fs.readFileSync(path.join(site, 'expected.json'), 'utf8')) as {
  config: { navigation: string; redirects: string };
  routes: string[];
  orphans: string[];
  findings: { rule: string; severity: string; file: string; line: number; column: number }[];
};
const config = { ...expected.config, cache: { enabled: false } };

/** The site's Markdown files as vfiles, as a build would read them (one as bytes, the rest as text). */
async function readSite(root: string): Promise<VFile[]> {
  const paths = (await glob('**/*.md', { cwd: root })).sort();
  return paths.map((p, i) => {
    const abs = path.join(root, p);
    return new VFile({ path: abs, value: i === 0 ? fs.readFileSync(abs) : fs.readFileSync(abs, 'utf8') });
  });
}

/** Run every file through `linkweaveCollect` in a remark pipeline, one file after another. */
async function collectAll(files: readonly VFile[], collector: ReturnType<typeof createCollector>): Promise<void> {
  const processor = unified().use(remarkParse).use(remarkFrontmatter).use(linkweaveCollect, { collector });
  for (const file of files) await processor.run(processor.parse(file), file);
}

/** The report without PageRank values, which are compared within a tolerance. */
function withoutRanks(report: Report): unknown {
  return { ...report, pages: report.pages.map(({ pagerank: _p, rank: _r, ...rest }) => rest) };
}

describe('linkweave/unified', () => {
  it('collector.report() equals analyze() on the same folder (pages, links, ranks within 1e-12, findings)', async () => {
    const files = await readSite(site);
    const collector = createCollector({ ...config, root: site });
    await collectAll(files, collector);
    const [fromPipeline, fromAnalyze] = await Promise.all([collector.report(), analyze({ ...config, root: site })]);

    expect(fromPipeline.pages.map((p) => p.route)).toEqual(expected.routes);
    const linkFindings = fromPipeline.findings.filter((f) => f.rule === 'broken-link' || f.rule === 'broken-fragment');
    expect(linkFindings.map(({ rule, severity, file, line, column }) => ({ rule, severity, file, line, column }))).toEqual(expected.findings);
    expect(fromPipeline.pages.filter((p) => p.inlinks === 0).map((p) => p.route)).toEqual(expected.orphans);
    expect(fromPipeline.findings.some((f) => f.rule === 'orphan-page' && f.file === 'reference/hydration.md')).toBe(true);
    // The navigation file's template links and the redirect were read as analyze reads them.
    expect(fromPipeline.links.some((l) => l.file === 'nav.yml' && l.to === '/guide/' && l.context === 'template')).toBe(true);
    expect(fromPipeline.links.find((l) => l.file === 'reference/hydration.md')).toMatchObject({ to: '/reference/feeding-schedule/', status: 'ok' });
    expect(fromPipeline.links.find((l) => l.to.endsWith('jar.png'))?.status).toBe('asset');

    expect(withoutRanks(fromPipeline)).toEqual(withoutRanks(fromAnalyze));
    for (const [i, page] of fromPipeline.pages.entries()) {
      expect(Math.abs(page.pagerank - fromAnalyze.pages[i]!.pagerank)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(page.rank - fromAnalyze.pages[i]!.rank)).toBeLessThanOrEqual(1e-12);
    }
  });

  it('attaches each file its findings as vfile messages: ruleId, source, line, column, fatal for errors', async () => {
    const files = await readSite(site);
    const collector = createCollector({ ...config, root: site });
    await collectAll(files, collector);
    const fromReport = await collector.report();
    for (const file of files) collector.attach(file);

    const byFile = new Map(files.map((f) => [path.relative(site, f.path).split(path.sep).join('/'), f]));
    const wanted: { rule: string; file: string; line: number; column: number }[] = [
      ...expected.findings,
      { rule: 'orphan-page', file: 'reference/hydration.md', line: 1, column: 1 },
    ];
    for (const want of wanted) {
      const message = byFile.get(want.file)!.messages.find((m) => m.ruleId === want.rule);
      expect(message, `${want.file} ${want.rule}`).toBeDefined();
      expect(message!.source).toBe('linkweave');
      expect([message!.line, message!.column]).toEqual([want.line, want.column]);
      const severity = fromReport.findings.find((f) => f.file === want.file && f.rule === want.rule)!.severity;
      expect(message!.fatal).toBe(severity === 'error');
    }
    expect(byFile.get('index.md')!.messages).toEqual([]);

    // vfile-reporter prints them like any lint rule's messages: place, severity, reason, rule.
    const printed = reporter(files, { quiet: true, color: false });
    expect(printed).toMatch(/first-starter\.md\n5:31\s+error\s+Broken link: no source file reference\/flour-types\.md[^\n]*broken-link\s+linkweave/);
    expect(printed).toMatch(/hydration\.md\n(?:.*\n)*?1:1\s+(?:warning|error)\s+No page links to [^\n]*orphan-page\s+linkweave/);
  });

  it('runs the report pass as a second unified plugin (linkweaveReport)', async () => {
    const files = await readSite(site);
    const collector = createCollector({ ...config, root: site });
    await collectAll(files, collector);
    const second = unified().use(remarkParse).use(remarkFrontmatter).use(linkweaveReport, { collector });
    for (const file of files) await second.run(second.parse(file), file);
    const starter = files.find((f) => f.path.endsWith('first-starter.md'))!;
    expect(starter.messages.map((m) => [m.ruleId, m.source, m.line, m.column])).toEqual([['broken-link', MESSAGE_SOURCE, 5, 31]]);
  });

  it("command 'suggest': the same suggestions as analyze, attached as info messages at the anchor", async () => {
    // The suggestion stage's fixture site (its own expected.json belongs to the suggest tests).
    const related = path.resolve(import.meta.dirname, '../fixtures/suggest-related');
    const files = await readSite(related);
    const collector = createCollector({ root: related, command: 'suggest', cache: { enabled: false } });
    await collectAll(files, collector);
    const [fromPipeline, fromAnalyze] = await Promise.all([
      collector.report(),
      analyze({ root: related, command: 'suggest', cache: { enabled: false } }),
    ]);
    expect(fromPipeline.suggestions.length).toBeGreaterThan(0);
    expect(fromPipeline).toEqual(fromAnalyze);
    for (const file of files) collector.attach(file);
    for (const s of fromPipeline.suggestions) {
      const file = files.find((f) => f.path === path.join(related, s.file))!;
      const info = file.messages.find((m) => m.ruleId === 'link-suggestion' && m.reason.includes(s.target));
      expect(info, `${s.file} -> ${s.target}`).toBeDefined();
      expect([info!.line, info!.column, info!.fatal, info!.source]).toEqual([s.line, s.column, undefined, 'linkweave']);
    }
  });

  it('gives the pages only of the files the pipeline processed, and takes vfiles relative to their cwd', async () => {
    const root = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-unified-'));
    try {
      fs.writeFileSync(path.join(root, 'index.md'), '# Home\n\n[About](about.md) and [notes](notes.md).\n');
      fs.writeFileSync(path.join(root, 'about.md'), '# About\n\n[Home](index.md)\n');
      fs.writeFileSync(path.join(root, 'notes.md'), '# Notes\n');
      const collector = createCollector({ root, cache: { enabled: false } });
      // Relative paths against the vfile's cwd, as unified-engine and to-vfile make them.
      const files = ['index.md', 'about.md'].map((p) => new VFile({ path: p, cwd: root, value: fs.readFileSync(path.join(root, p), 'utf8') }));
      await collectAll(files, collector);
      expect(collector.files()).toEqual(['about.md', 'index.md']);
      const report = await collector.report();
      expect(report.pages.map((p) => p.route)).toEqual(['/', '/about/']);
      expect(report.findings.map((f) => [f.rule, f.file, f.line, f.column])).toEqual([['broken-link', 'index.md', 3, 23]]);
      // Processing a changed file again replaces its facts and the next report sees the change.
      const fixed = new VFile({ path: 'index.md', cwd: root, value: '# Home\n\n[About](about.md)\n' });
      await collectAll([fixed], collector);
      expect((await collector.report()).findings).toEqual([]);
    } finally {
      fs.rmSync(root, { recursive: true, force: true });
    }
  });

  it('leaves out a file outside the root with a message saying so', async () => {
    const collector = createCollector({ root: site, cache: { enabled: false } });
    const outside = new VFile({ path: path.join(os.tmpdir(), 'elsewhere.md'), value: '# Elsewhere\n' });
    await collectAll([outside], collector);
    expect(collector.files()).toEqual([]);
    expect(outside.messages.map((m) => [m.ruleId, m.source, m.fatal])).toEqual([['not-collected', 'linkweave', false]]);
    expect(outside.messages[0]!.reason).toContain('outside the content root');
  });

  it('rejects a bad configuration with the key named, and attach() before report()', async () => {
    expect(() => createCollector({ root: site, maxDepth: -1 })).toThrowError(/key "maxDepth"/);
    const collector = createCollector({ root: site });
    const error = (() => {
      try {
        collector.attach(new VFile({ path: path.join(site, 'index.md'), value: '' }));
      } catch (e) {
        return e;
      }
      return null;
    })();
    expect(isEngineError(error) && error.code).toBe('E_USAGE');
    expect(() => unified().use(linkweaveCollect, {} as never).freeze()).toThrowError(/expected options \{ collector \}/);
  });
});
