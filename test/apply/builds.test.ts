/**
 * Real generator builds after `apply` (Debian's `hugo`, `mkdocs`, `jekyll`; each test is skipped,
 * with a notice naming the package, where the generator is not installed). For each fixture site
 * in the generator's own layout (test/fixtures/build-*):
 *
 * 1. the untouched site is built;
 * 2. `suggest` runs as a user runs it (`node dist/cli/bin.js suggest ... --format json`), and
 *    `apply --all` writes its suggestions (`applySuggestions`, the command's Node API);
 * 3. a second report, made by hand, suggests every case-insensitive occurrence of every page
 *    title in every source (inside shortcodes, includes, attributes, front matter and comments
 *    too), and `apply --all` writes it: what lies in protected syntax must be refused;
 * 4. the edited site is built: the build succeeds, each applied link is in the built page at its
 *    anchor (its text, and an href resolving to the target), and every built page equals the
 *    untouched build's once links are unwrapped (tags, attributes, text, comments), with exactly
 *    one `<a>` more per applied link.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { applySuggestions } from '../../src/apply/index.js';
import type { AppliedLink } from '../../src/apply/index.js';
import { resolveOptions } from '../../src/config/options.js';
import type { Report, Suggestion } from '../../src/types.js';
import { tempDir } from '../collect/tree.js';
import { linksOf, parseHtml, shapeWithoutLinks } from './built-html.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const cli = path.join(repo, 'dist', 'cli', 'bin.js');

interface Generator {
  readonly name: string;
  readonly fixture: string;
  readonly bin: string;
  /** The content root linkweave reads, relative to the site. */
  readonly content: string;
  readonly build: (site: string, out: string) => string[];
}

const GENERATORS: readonly Generator[] = [
  { name: 'Hugo 0.111', fixture: 'build-hugo', bin: 'hugo', content: 'content', build: (site, out) => ['--quiet', '--source', site, '--destination', out] },
  { name: 'MkDocs 1.4', fixture: 'build-mkdocs', bin: 'mkdocs', content: 'docs', build: (site, out) => ['build', '-q', '-f', path.join(site, 'mkdocs.yml'), '-d', out] },
  { name: 'Jekyll 4.3', fixture: 'build-jekyll', bin: 'jekyll', content: '.', build: (site, out) => ['build', '-q', '-s', site, '-d', out] },
];

const installed = (bin: string) => spawnSync('sh', ['-c', `command -v ${bin}`]).status === 0;

function build(g: Generator, site: string, out: string): void {
  // SOURCE_DATE_EPOCH: MkDocs stamps its build date in a comment otherwise.
  const r = spawnSync(g.bin, g.build(site, out), { cwd: site, encoding: 'utf8', timeout: 120_000, env: { ...process.env, SOURCE_DATE_EPOCH: '1700000000' } });
  expect(r.status, `${g.bin} build failed:\n${r.stdout}\n${r.stderr}`).toBe(0);
}

/** Built HTML files under `out`, relative, sorted. */
function htmlFiles(out: string): string[] {
  return fs
    .readdirSync(out, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith('.html'))
    .map((f) => f.split(path.sep).join('/'))
    .sort();
}

/** A report suggesting every case-insensitive occurrence of every other page's title in each source. */
function everyTitleOccurrence(root: string, report: Report): Suggestion[] {
  const out: Suggestion[] = [];
  for (const page of report.pages) {
    const text = fs.readFileSync(path.join(root, page.file), 'utf8');
    const hash = createHash('sha256').update(fs.readFileSync(path.join(root, page.file))).digest('hex');
    for (const target of report.pages) {
      if (target.route === page.route || target.title.length < 6) continue;
      const find = new RegExp(target.title.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'), 'gi');
      for (const m of text.matchAll(find)) {
        const before = text.slice(0, m.index).split('\n');
        out.push({
          id: `${page.file}@${m.index}>${target.route}`, source: page.route, target: target.route, file: page.file, line: before.length,
          column: before[before.length - 1]!.length + 1, offset: m.index, endOffset: m.index + m[0].length, anchor: m[0], similarity: 0.5,
          score: 0.5, targetRankBefore: 0.1, targetRankAfter: null, depthBefore: 1, depthAfter: 1, reason: '', sourceHash: hash,
        });
      }
    }
  }
  return out;
}

describe('real generator builds after apply --all', () => {
  for (const g of GENERATORS) {
    const ok = installed(g.bin);
    if (!ok) console.warn(`NOTICE: ${g.bin} is not installed: the ${g.name} build test is skipped (apt-get install ${g.bin}; .ci/run installs it)`);
    it.skipIf(!ok)(`${g.name}${ok ? '' : ` (skipped: ${g.bin} not installed)`}: builds, links at their anchors, pages equal but for the new <a>`, async () => {
      const t = tempDir('linkweave-build-');
      try {
        const site = path.join(t.dir, 'site');
        fs.cpSync(path.join(repo, 'test', 'fixtures', g.fixture), site, { recursive: true });
        const content = path.join(site, g.content);
        build(g, site, path.join(t.dir, 'before'));

        const suggest = spawnSync(
          process.execPath,
          [cli, 'suggest', g.content, '--config', 'linkweave.config.json', '--format', 'json', '--output', path.join(t.dir, 'report.json'), '--quiet', '--no-cache'],
          { cwd: site, encoding: 'utf8' },
        );
        expect([0, 1], suggest.stderr).toContain(suggest.status);
        const report = JSON.parse(fs.readFileSync(path.join(t.dir, 'report.json'), 'utf8')) as Report;
        const config = JSON.parse(fs.readFileSync(path.join(site, 'linkweave.config.json'), 'utf8')) as unknown;
        const options = resolveOptions(config, content);

        const first = await applySuggestions({ options, report, selection: 'all' });
        expect(first.applied.length).toBeGreaterThan(0);
        expect(first.notApplied.filter((n) => n.code !== 'no-anchor')).toEqual([]);

        const forced = everyTitleOccurrence(content, report);
        const second = await applySuggestions({ options, report: { pages: report.pages, suggestions: forced }, selection: 'all' });
        const refusedByKind: Record<string, number> = {};
        for (const n of second.notApplied) if (n.code === 'protected') refusedByKind[n.kind!] = (refusedByKind[n.kind!] ?? 0) + 1;
        expect(Object.values(refusedByKind).reduce((a, b) => a + b, 0)).toBeGreaterThan(0);

        const after = path.join(t.dir, 'after');
        build(g, site, after);
        const applied: AppliedLink[] = [...first.applied, ...second.applied];
        const routeOf = new Map(report.pages.map((p) => [p.file, p.route]));
        for (const a of applied) {
          const route = routeOf.get(a.file)!;
          const html = fs.readFileSync(path.join(after, ...route.split('/').filter(Boolean), 'index.html'), 'utf8');
          const found = linksOf(parseHtml(html)).filter(
            (l) => l.text === a.anchor.replace(/\s+/g, ' ') && new URL(l.href, `http://site.test${route}`).pathname === a.target,
          );
          expect(found.length, `${a.file}: <a> "${a.anchor}" -> ${a.target}`).toBeGreaterThan(0);
        }

        const pages = htmlFiles(path.join(t.dir, 'before'));
        expect(htmlFiles(after)).toEqual(pages);
        let newLinks = 0;
        for (const file of pages) {
          const before = parseHtml(fs.readFileSync(path.join(t.dir, 'before', file), 'utf8'));
          const edited = parseHtml(fs.readFileSync(path.join(after, file), 'utf8'));
          expect(shapeWithoutLinks(edited), file).toEqual(shapeWithoutLinks(before));
          newLinks += linksOf(edited).length - linksOf(before).length;
        }
        // No theme repeats the body elsewhere: each applied link is one new <a>.
        expect(newLinks).toBe(applied.length);
        console.info(`${g.name}: ${first.applied.length} suggested links applied, ${second.applied.length} more by hand; refused in protected regions: ${JSON.stringify(refusedByKind)}`);
      } finally {
        if (process.env.KEEP === undefined) t.cleanup();
        else console.log('kept', t.dir);
      }
    });
  }
});
