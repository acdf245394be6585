/**
 * Issue 7, "paths": no link, pattern, navigation entry, redirect, frontmatter key or symlink
 * makes linkweave read a file outside the content root. A canary file with a fixed string
 * sits beside the root (and in a folder beside it); the site links to it in every way we could
 * think of; `analyze` (check and suggest) and the built CLI (every format, stdout and --output)
 * run over it, and the canary string must appear nowhere: not in any report field, not in any
 * output. /etc/passwd's first line is checked the same way.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FORMAT_IDS } from '../../src/report/index.js';
import type { Report } from '../../src/types.js';
import { allFormats, project, run, cleanupAll } from './helpers.js';
import type { Tree } from './helpers.js';

/** Fixed, unlikely to occur by chance, never written inside the content root. */
const CANARY = 'LW-CANARY-5d1e9a7c3b0f';
const CANARY_PAGE = `---\ntitle: ${CANARY} title\n---\n# ${CANARY} heading\n\n${CANARY} body text with [a ${CANARY} link](/${CANARY}/).\n`;
const CANARY_HTML = `<title>${CANARY}</title><h1 id="${CANARY}">${CANARY}</h1><a href="/${CANARY}/">${CANARY}</a>`;
/** The first line of /etc/passwd, when there is one (it must never be read either). */
const PASSWD = fs.existsSync('/etc/passwd') ? fs.readFileSync('/etc/passwd', 'utf8').split('\n')[0]! : null;

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const bin = path.join(repo, 'dist', 'cli', 'bin.js');

const PATTERN = { pattern: '\\{\\{ref "([^"]+)"\\}\\}', route: '$1' };

/** The hostile site: `<dir>/docs` is the root; the canaries are at `<dir>/canary.*` and `<dir>/outside/`. */
function hostileSite(): { dir: string; root: string } {
  // The project folder's path is known only once it exists: absolute links are added after.
  const p = project({
    'canary.md': CANARY_PAGE,
    'canary.html': CANARY_HTML,
    'outside/canary.md': CANARY_PAGE,
    'outside/canary.html': CANARY_HTML,
    'outside/sub/page.md': CANARY_PAGE,
    'outside/pic.png': CANARY,
  });
  const abs = path.join(p.dir, 'canary.md');
  const hrefs = [
    '../canary.md',
    '../../canary.md',
    '../../../../../../../../etc/passwd',
    '../outside/canary.md',
    '../outside/canary.html',
    '../outside/sub/page.md',
    '../outside/pic.png',
    '/../canary.md',
    '/..%2f..%2fcanary.md',
    '/..%2f..%2fetc/passwd',
    '%2e%2e/canary.md',
    '%2e%2e%2fcanary.md',
    '..%2fcanary.md',
    '%252e%252e/canary.md',
    '%c0%ae%c0%ae/canary.md',
    '..%c0%afcanary.md',
    '....//canary.md',
    '..;/canary.md',
    '..\\canary.md',
    '/..\\..\\canary.md',
    '//../canary.md',
    'file:///etc/passwd',
    `file://${abs}`,
    abs,
    `/${abs}`,
    abs.replace(/\//g, '\\'),
    '../canary.md%00.md',
    '%00../canary.md',
    '../canary.md&#0;',
    '../canary.md?x=1#top',
    '../CANARY.MD',
  ];
  const mdLinks = hrefs.map((h, i) => `- [way ${i}](<${h.replace(/[<>]/g, '')}>)`).join('\n');
  const tree: Tree = {
    'docs/index.md': [
      '# Home',
      '',
      'Start at [the guide](guide.md), the [legacy page](legacy.html), [the sub page](sub/page.md) and [the NUL page](nul.md).',
      '',
      mdLinks,
      '',
      `Raw HTML: <a href="../canary.md">raw</a> <a href="${abs}">raw abs</a>.`,
      '',
      `Images are no links: ![pic](../outside/pic.png)`,
      '',
      '{{ref "../../canary.md"}} {{ref "../canary.md"}} {{ref "/../canary.md"}} {{ref "../outside/canary.html"}}',
      `{{ref "${abs}"}} {{ref "..%2fcanary.md"}} {{ref "../canary"}}`,
      '',
    ].join('\n'),
    'docs/guide.md': '# Guide\n\nBack [home](index.md), or to [the aliased page](alias.md) and [the moved page](perma.md).\n',
    'docs/legacy.html':
      '<html><head><title>Legacy</title><base href="../../"></head><body>' +
      '<a href="canary.md">base-relative</a> <a href="../canary.html">up</a> <a href="file:///etc/passwd">file</a>' +
      `<a href="${abs}">abs</a></body></html>`,
    'docs/alias.md': '---\nslug: ../../canary\naliases: ["../../canary.md", "/../outside/canary/", "../canary.html"]\n---\n# Aliased\n\nTo [the guide](guide.md).\n',
    'docs/perma.md': '---\npermalink: /../../outside/canary.md\n---\n# Moved\n\nTo [the guide](guide.md).\n',
    'docs/nav.md': `- [Home](index.md)\n- [Canary](../canary.md)\n- [Out](../outside/canary.md)\n- [Abs](${abs})\n- [Up](/../../canary.md)\n`,
    'docs/_redirects': `/old/ ../canary.md\n/old2/ /../../canary.md\n/etc/ file:///etc/passwd\n../canary.md /\n/abs/ ${abs}\n`,
    // Symlinks: to a file and a folder outside, absolute and relative, to the root's parent; a loop.
    'docs/leak.md': { symlink: '../canary.md' },
    'docs/leak-abs.md': { symlink: abs },
    'docs/leak-dir': { symlink: '../outside' },
    'docs/parent': { symlink: '..' },
    'docs/sub/deep-leak.html': { symlink: '../../outside/canary.html' },
    'docs/sub/loop': { symlink: '.' },
    'docs/sub/page.md': '# Sub\n\n[home](../index.md)\n',
    // A NUL byte in the first 8 KiB makes a file binary; after it, it is text with a NUL in an href.
    'docs/nul.md': `# NUL\n\n${'Filler prose. '.repeat(700)}\n\n[nul](../canary.md\u0000) <a href="../canary.md\u0000x">nul html</a> [back](index.md)\n`,
  };
  for (const [rel, content] of Object.entries(tree)) {
    const file = path.join(p.dir, ...rel.split('/'));
    fs.mkdirSync(path.dirname(file), { recursive: true });
    if (typeof content === 'object' && 'symlink' in content) fs.symlinkSync(content.symlink, file);
    else fs.writeFileSync(file, content);
  }
  return p;
}

const CONFIG = { linkPatterns: [PATTERN], navigation: 'nav.md', redirects: '_redirects' };

function expectNoCanary(text: string, where: string): void {
  expect(text.includes(CANARY), `${where} holds the canary`).toBe(false);
  if (PASSWD !== null && PASSWD.length > 8) expect(text.includes(PASSWD), `${where} holds /etc/passwd`).toBe(false);
}

let site: { dir: string; root: string };
const reports: Record<string, Report> = {};
beforeAll(async () => {
  site = hostileSite();
  for (const command of ['check', 'suggest'] as const) reports[command] = await run(site.root, { ...CONFIG, command });
});
afterAll(cleanupAll);

describe('a canary outside the content root is never read', () => {
  it('analyze (check and suggest): no report field and no format holds the canary', () => {
    for (const [command, report] of Object.entries(reports)) {
      expectNoCanary(JSON.stringify(report), `${command} report`);
      for (const [id, text] of Object.entries(allFormats(report))) expectNoCanary(text, `${command} ${id}`);
    }
  });

  it('the pages are the files inside the root, nothing else', () => {
    const report = reports.suggest!;
    expect(report.pages.map((p) => p.file).sort()).toEqual(['alias.md', 'guide.md', 'index.md', 'legacy.html', 'nul.md', 'perma.md', 'sub/page.md']);
    // Frontmatter routes with dot segments are resolved as a browser resolves them.
    expect(report.pages.find((p) => p.file === 'alias.md')!.route).toBe('/canary/');
    expect(report.pages.find((p) => p.file === 'perma.md')!.route).toBe('/outside/canary.md/');
    // A NUL byte in an href is read as U+FFFD (CommonMark 2.3 "Insecure characters"; the HTML
    // standard's tokenizer does the same in attribute values): the links are broken.
    expect(report.links.filter((l) => l.file === 'nul.md').map((l) => [l.to, l.status])).toEqual([
      ['/canary.md\uFFFD', 'broken'],
      ['/canary.md\uFFFDx', 'broken'],
      ['/', 'ok'],
    ]);
    // No route or link target escapes the root's URL space with a dot segment.
    for (const p of report.pages) expect(p.route.split('/')).not.toContain('..');
    for (const l of report.links) if (l.kind === 'internal' && l.status === 'ok') expect(l.to.split(/[/#]/)).not.toContain('..');
    // Every hostile link resolved to a page of the site, or is broken, external or other: never to a file outside.
    const index = report.links.filter((l) => l.file === 'index.md');
    expect(index.length).toBeGreaterThan(40);
    for (const l of index) {
      if (l.status === 'ok' || l.status === 'self') expect(report.pages.map((p) => p.route)).toContain(l.to.split('#')[0]);
      else expect(['broken', 'other', 'external', 'broken-fragment', 'outside']).toContain(l.status);
    }
  });

  it('symlinks out of the root are skipped with a warning naming them; the loop ends', () => {
    const report = reports.check!;
    const warnings = report.findings.filter((f) => f.rule === 'source-problem' && f.route === '').map((f) => [f.file, f.target]);
    expect(warnings).toEqual(
      expect.arrayContaining([
        ['leak-abs.md', 'symlink-outside'],
        ['leak-dir', 'symlink-outside'],
        ['leak.md', 'symlink-outside'],
        ['parent', 'symlink-outside'],
        ['sub/deep-leak.html', 'symlink-outside'],
        ['sub/loop', 'symlink-loop'],
      ]),
    );
    for (const f of report.findings.filter((x) => x.target === 'symlink-outside')) {
      expect(f.message).toMatch(/points outside the content root; skipped|resolves outside the content root; skipped/);
      expect(f.severity).toBe('warning');
    }
  });

  it('the built CLI, every format on stdout and in --output, check and suggest: the canary appears nowhere', () => {
    fs.writeFileSync(path.join(site.dir, 'linkweave.config.json'), JSON.stringify({ ...CONFIG, cache: { enabled: false } }));
    const runs: [string, string][] = [
      ...FORMAT_IDS.map((f): [string, string] => ['suggest', f]),
      ['check', 'json'],
    ];
    for (const [command, format] of runs) {
      const out = path.join(site.dir, 'out', `report-${command}.${format}`);
      const r = spawnSync(process.execPath, [bin, command, 'docs', '--format', format, '--output', out], {
        cwd: site.dir,
        encoding: 'utf8',
        env: { PATH: process.env.PATH ?? '', NO_COLOR: '1' },
      });
      // The gate fails (broken links, symlink warnings are findings): exit 1, never 2.
      expect(r.status, `${command} ${format}: ${r.stderr}`).toBe(1);
      expectNoCanary(r.stdout, `${command} ${format} stdout`);
      expectNoCanary(r.stderr, `${command} ${format} stderr`);
      expect(fs.existsSync(out), `${command} ${format}: ${r.stdout.slice(0, 300)} ${r.stderr}`).toBe(true);
      expectNoCanary(fs.readFileSync(out, 'utf8'), `${command} ${format} file`);
    }
    const json = JSON.parse(fs.readFileSync(path.join(site.dir, 'out', 'report-check.json'), 'utf8')) as Report;
    expect(json.pages.map((p) => p.file)).toEqual(reports.check!.pages.map((p) => p.file));
  });
});
