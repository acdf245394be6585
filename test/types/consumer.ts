/**
 * Type test of the public API, written as a consumer writes it. Compiled twice, never run:
 * - by `npm run typecheck`, against the sources (the imports below);
 * - by test/types/consumer.test.ts, against the built package in a temp project, with each
 *   `../../src/...` import rewritten to its package entry point (`linkweave`,
 *   `linkweave/unified`, `linkweave/vite`, `linkweave/rollup`), so the `exports` map and the
 *   emitted declarations are what is checked.
 * Each `@ts-expect-error` line is a mistake the types must reject: if a type loosens (say, to
 * `any`), the directive is unused and the compile fails.
 */
import remarkParse from 'remark-parse';
import type { Plugin as RolldownPlugin } from 'rolldown';
import { unified } from 'unified';
import type { VFile } from 'vfile';
import { defineConfig } from 'vite';
import type { Plugin as VitePlugin } from 'vite';
import { analyze, EngineError, formatReport, isEngineError, resolveOptions, writeFileAtomic } from '../../src/index.js';
import type { Config, ErrorCode, Finding, FormatId, Report, ResolvedOptions } from '../../src/index.js';
import rollupPlugin from '../../src/plugins/rollup.js';
import { createCollector, linkweaveCollect, linkweaveReport } from '../../src/plugins/unified.js';
import type { Collector, VFileMessage } from '../../src/plugins/unified.js';
import linkweave, { linkweave as namedLinkweave } from '../../src/plugins/vite.js';
import type { LinkweaveBuildOptions } from '../../src/plugins/vite.js';

/** Never called: the body only has to compile. */
export async function consumer(file: VFile): Promise<void> {
  // Node API: one configuration type for every entry point.
  const config: Config = {
    maxDepth: 4,
    routes: { style: 'html', basePath: '/docs/' },
    checks: { 'orphan-page': { level: 'none' }, 'dead-end': { level: 'warning', countTemplateLinks: true } },
    limits: { brokenLinks: 0, orphans: null },
    suggest: { perTarget: 3 },
  };
  const report: Report = await analyze({ ...config, root: 'docs', command: 'suggest' });
  const findings: readonly Finding[] = report.findings;
  const severity: 'error' | 'warning' | undefined = findings[0]?.severity;
  const rank: number | undefined = report.pages[0]?.pagerank;
  const format: FormatId = 'sarif';
  const markdown: string = formatReport(report, 'markdown');
  await writeFileAtomic('report.sarif', formatReport(report, format));
  const resolved: ResolvedOptions = resolveOptions(config, '/site');
  const depth: number = resolved.maxDepth;

  // @ts-expect-error maxDepth is a number, not a string
  await analyze({ root: 'docs', maxDepth: '3' });
  // @ts-expect-error the content root is required
  await analyze({ maxDepth: 3 });
  // @ts-expect-error `command` is 'check' or 'suggest'
  await analyze({ root: 'docs', command: 'fix' });
  // @ts-expect-error no such key
  const wrongKey: Config = { maxDeep: 3 };
  // @ts-expect-error routes.style is 'directory' or 'html'
  const wrongStyle: Config = { routes: { style: 'pretty' } };
  // @ts-expect-error no such format
  formatReport(report, 'pdf');

  try {
    await analyze({ root: 'docs' });
  } catch (error) {
    if (isEngineError(error)) {
      const code: ErrorCode = error.code;
      // @ts-expect-error codes are a closed union
      const other: ErrorCode = 'E_SOMETHING';
      void [code, other];
    }
    if (error instanceof EngineError) void error.code;
  }

  // unified: a collector shared by the pipeline's files.
  const collector: Collector = createCollector({ root: 'docs', maxDepth: 2 });
  const processor = unified().use(remarkParse).use(linkweaveCollect, { collector });
  await processor.run(processor.parse(file), file);
  const fromPipeline: Report = await collector.report();
  const messages: VFileMessage[] = collector.attach(file);
  const ruleId: string | undefined = messages[0]?.ruleId;
  unified().use(linkweaveReport, { collector });
  // @ts-expect-error the collector option is required
  unified().use(linkweaveCollect, {});
  // @ts-expect-error createCollector takes the same options as analyze
  createCollector({ root: 'docs', damping: 'high' });

  // Vite and Rollup: the same plugin object.
  const options: LinkweaveBuildOptions = { outDir: 'dist', config, reports: [{ format: 'json', file: 'linkweave.json' }], failBuild: false };
  const vitePlugin: VitePlugin = linkweave(options);
  const rolldownPlugin: RolldownPlugin = rollupPlugin({ config: 'linkweave.config.json' });
  const viteConfig = defineConfig({ plugins: [namedLinkweave()] });
  // @ts-expect-error failBuild is a boolean
  linkweave({ failBuild: 'no' });
  // @ts-expect-error no such report format
  linkweave({ reports: [{ format: 'pdf', file: 'x.pdf' }] });
  // @ts-expect-error plugin configuration is checked like analyze's
  linkweave({ config: { maxDepth: '2' } });

  void [severity, rank, markdown, depth, wrongKey, wrongStyle, fromPipeline, ruleId, vitePlugin, rolldownPlugin, viteConfig];
}
