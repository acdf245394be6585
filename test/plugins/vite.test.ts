/**
 * The build plugin in real Vite builds (vite 8, `build()` from its Node API) of small
 * multi-page sites: the plugin's report equals `analyze` on the built output; a broken link
 * fails the build with the finding at file:line:column; `failBuild: false` passes and still
 * writes the report.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { build, createLogger } from 'vite';
import type { InlineConfig, Logger } from 'vite';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import { linkweave } from '../../src/plugins/vite.js';
import type { LinkweaveBuildOptions } from '../../src/plugins/vite.js';
import type { Report } from '../../src/types.js';

const fixtures = path.resolve(import.meta.dirname, '../fixtures');
const temp = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-vite-'));
afterAll(() => fs.rmSync(temp, { recursive: true, force: true }));

const noCache = { cache: { enabled: false } };

/** A Vite logger that keeps what it is given (and prints nothing). */
function recordingLogger(): Logger & { lines: { level: string; text: string }[] } {
  const base = createLogger('info', { allowClearScreen: false });
  const lines: { level: string; text: string }[] = [];
  return {
    ...base,
    lines,
    info: (text) => void lines.push({ level: 'info', text }),
    warn: (text) => void lines.push({ level: 'warn', text }),
    warnOnce: (text) => void lines.push({ level: 'warn', text }),
    error: (text) => void lines.push({ level: 'error', text }),
  };
}

/** `vite build` of a fixture site, every HTML page a multi-page input, into a fresh temp folder. */
async function viteBuild(site: string, inputs: Record<string, string>, plugin: LinkweaveBuildOptions, logger = recordingLogger()) {
  const root = path.join(fixtures, site);
  const outDir = fs.mkdtempSync(path.join(temp, `${site}-`));
  const config: InlineConfig = {
    root,
    configFile: false,
    logLevel: 'info',
    customLogger: logger,
    build: {
      outDir,
      emptyOutDir: true,
      rolldownOptions: { input: Object.fromEntries(Object.entries(inputs).map(([k, v]) => [k, path.join(root, v)])) },
    },
    plugins: [linkweave(plugin)],
  };
  return { outDir, logger, run: () => build(config) };
}

describe('linkweave/vite in a real Vite build', () => {
  it('analyses the built HTML pages; the report equals analyze() on the output folder', async () => {
    const expected = JSON.parse(fs.readFileSync(path.join(fixtures, 'vite-site/expected.json'), 'utf8')) as {
      inputs: Record<string, string>;
      routes: string[];
    };
    const reportFile = path.join(temp, 'site-report.json');
    const { outDir, logger, run } = await viteBuild('vite-site', expected.inputs, {
      config: noCache,
      reports: [{ format: 'json', file: reportFile }],
    });
    await run();

    // The build wrote the pages and a bundled script; only the pages are pages.
    expect(fs.readdirSync(path.join(outDir, 'assets')).some((f) => f.endsWith('.js'))).toBe(true);
    const fromPlugin = JSON.parse(fs.readFileSync(reportFile, 'utf8')) as Report;
    expect(fromPlugin.root).toBe(outDir);
    expect(fromPlugin.pages.map((p) => p.route)).toEqual(expected.routes);
    expect(fromPlugin.findings).toEqual([]);
    expect(fromPlugin.gate.passed).toBe(true);
    // Fragment links resolved against the built pages' ids.
    expect(fromPlugin.links.find((l) => l.to === '/reference.html' && l.file === 'guide/install.html')?.status).toBe('ok');

    const direct = await analyze({ include: ['**/*.html'], ...noCache, root: outDir });
    expect(fromPlugin).toEqual(JSON.parse(JSON.stringify(direct)));

    // The summary went through Vite's logger. 17 links: the navigation bar's 3 on each of the 4
    // pages, and 5 in the pages' text; every page is one click from home through the bar.
    const info = logger.lines.filter((l) => l.level === 'info').map((l) => l.text);
    expect(info).toContain(
      'linkweave: 4 pages, 17 links, 0 broken links, 0 broken fragments, 0 orphan pages, 0 unreachable, 0 dead ends, deepest page 1 click (limit 3). Findings: none. The build passes: no errors, no limit crossed.',
    );
  });

  it('fails the build when the gate fails, naming the finding at file:line:column', async () => {
    const inputs = { main: 'index.html', tags: 'tags.html', search: 'search.html' };
    const reportFile = path.join(temp, 'broken-report.sarif');
    const { outDir, run } = await viteBuild('vite-broken', inputs, { config: noCache, reports: [{ format: 'sarif', file: reportFile }] });
    const error = await run().then(
      () => null,
      (e: unknown) => e as Error,
    );
    expect(error).not.toBeNull();
    // Our EngineError; the bundler (as Rollup does) moves its code to `pluginCode`.
    expect(error).toMatchObject({ name: 'EngineError', plugin: 'linkweave', pluginCode: 'E_GATE_FAILED' });
    // Where the link is in the built page (Vite rewrites the head, so it is read off the output).
    const built = fs.readFileSync(path.join(outDir, 'tags.html'), 'utf8');
    const offset = built.indexOf('<a href="syntax.html"');
    const line = built.slice(0, offset).split('\n').length;
    const column = offset - built.lastIndexOf('\n', offset - 1);
    expect(error!.message).toContain(`${path.join(outDir, 'tags.html')}:${line}:${column}  error  Broken link: no page`);
    expect(error!.message).toContain('(broken-link)');
    expect(error!.message).toContain('The build fails: broken-link 1 error.');
    expect(error!.message).toContain('failBuild: false');
    // The report is written before the build fails, for CI to keep.
    const sarif = JSON.parse(fs.readFileSync(reportFile, 'utf8')) as { runs: { results: { ruleId: string }[] }[] };
    expect(sarif.runs[0]!.results.map((r) => r.ruleId)).toContain('broken-link');
  });

  it('with failBuild: false the build passes, warns with the findings and still writes the report', async () => {
    const inputs = { main: 'index.html', tags: 'tags.html', search: 'search.html' };
    const reportFile = path.join(temp, 'broken-report.json');
    const { outDir, logger, run } = await viteBuild('vite-broken', inputs, {
      config: noCache,
      failBuild: false,
      reports: [{ format: 'json', file: reportFile }],
    });
    await run();
    const report = JSON.parse(fs.readFileSync(reportFile, 'utf8')) as Report;
    expect(report.gate.passed).toBe(false);
    expect(report.findings.map((f) => [f.rule, f.file])).toEqual([['broken-link', 'tags.html']]);
    expect(report).toEqual(JSON.parse(JSON.stringify(await analyze({ include: ['**/*.html'], ...noCache, root: outDir }))));
    const warnings = logger.lines.filter((l) => l.level === 'warn').map((l) => l.text).join('\n');
    expect(warnings).toContain(`${path.join(outDir, 'tags.html')}:`);
    expect(warnings).toContain('(broken-link)');
  });

  it('skips an SSR build (server code, no pages) and a build that writes nothing', async () => {
    const root = path.join(fixtures, 'vite-site');
    for (const build_ of [{ ssr: path.join(root, 'src/main.js') }, { write: false }]) {
      const logger = recordingLogger();
      const outDir = fs.mkdtempSync(path.join(temp, 'skipped-'));
      await build({
        root,
        configFile: false,
        customLogger: logger,
        build: { outDir, emptyOutDir: true, ...build_ },
        plugins: [linkweave({ config: noCache, reports: [{ format: 'json', file: path.join(outDir, 'never.json') }] })],
      });
      expect(logger.lines.some((l) => l.text.startsWith('linkweave')), JSON.stringify(build_)).toBe(false);
      expect(fs.existsSync(path.join(outDir, 'never.json'))).toBe(false);
    }
  });

  it('rejects a report with an unknown format before the build, naming the option', () => {
    expect(() => linkweave({ reports: [{ format: 'pdf' as never, file: 'x.pdf' }] })).toThrowError(/"reports\.0\.format": unknown format "pdf"/);
  });
});
