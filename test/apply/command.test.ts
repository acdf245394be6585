/**
 * `linkweave apply` through `run()` on real files in temp folders: by id, all, from a report;
 * dry run (nothing written, a unified diff that `applyPatch` turns into what a real run
 * writes); refusal of a changed source; the link style; exit codes; a new check after apply
 * shows the predicted depth and rank.
 */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { applyPatch, parsePatch } from 'diff';
import { afterEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import type { CliIo } from '../../src/cli/io.js';
import { run } from '../../src/cli/run.js';
import { parseSource } from '../../src/parse/index.js';
import { DEFAULT_OPTIONS } from '../../src/config/options.js';
import type { Report, Suggestion } from '../../src/types.js';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Tree } from '../collect/tree.js';

const fixture = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures', 'pr-base');
const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

/** A working folder with the pr-base site copied to `docs/` (or `tree` written there). */
function project(tree?: Tree): { cwd: string; root: string } {
  const t = tempDir('linkweave-apply-');
  cleanups.push(t.cleanup);
  const root = path.join(t.dir, 'docs');
  if (tree === undefined) fs.cpSync(fixture, root, { recursive: true });
  else writeTree(root, tree);
  return { cwd: t.dir, root };
}

async function cli(cwd: string, argv: string[]) {
  let stdout = '';
  let stderr = '';
  const io: CliIo = { stdout: { write: (s: string) => (stdout += s) }, stderr: { write: (s: string) => (stderr += s) }, cwd, env: {}, isTTY: false };
  const code = await run(argv, io);
  return { code, stdout, stderr };
}

/** Every file under `dir` with the sha256 of its bytes. */
function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const entry of fs.readdirSync(dir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile()) continue;
    const file = path.join(entry.parentPath, entry.name);
    out[path.relative(dir, file)] = createHash('sha256').update(fs.readFileSync(file)).digest('hex');
  }
  return out;
}

async function suggestions(cwd: string): Promise<Report> {
  const r = await cli(cwd, ['suggest', 'docs', '--format', 'json', '--output', 'report.json', '--quiet', '--no-cache']);
  expect(r.code).toBe(1);
  return JSON.parse(fs.readFileSync(path.join(cwd, 'report.json'), 'utf8')) as Report;
}

const byAnchor = (report: Report, anchor: string | null, file?: string): Suggestion =>
  report.suggestions.find((s) => s.anchor === anchor && (file === undefined || s.file === file))!;

describe('apply on the pr-base site', () => {
  it('--dry-run writes nothing and prints a unified diff that gives what a real run writes', async () => {
    const { cwd, root } = project();
    const report = await suggestions(cwd);
    const ids = report.suggestions.filter((s) => s.anchor !== null).map((s) => s.id);
    expect(ids).toHaveLength(2);
    const before = snapshot(cwd);
    const dry = await cli(cwd, ['apply', 'docs', '--ids', ids.join(','), '--dry-run']);
    expect(dry.code).toBe(0);
    expect(snapshot(cwd)).toEqual(before);
    expect(dry.stdout).toMatch(/^--- a\/docs\/guide\/install\.md\n\+\+\+ b\/docs\/guide\/install\.md\n@@ -7,6 \+7,6 @@\n/);
    expect(dry.stdout).toContain('\n-evenings tuning the flame sensor so the lamp does not flicker in fog.\n');
    expect(dry.stdout).toContain('\n+evenings [tuning the flame sensor](tuning.md) so the lamp does not flicker in fog.\n');
    expect(dry.stdout).toContain('+++ b/docs/reference/codes.md\n');
    expect(dry.stderr).toContain('Would apply 2 links in 2 files (dry run: nothing written)');

    const originals = Object.fromEntries(['guide/install.md', 'reference/codes.md'].map((f) => [f, fs.readFileSync(path.join(root, f), 'utf8')]));
    const real = await cli(cwd, ['apply', 'docs', '--ids', ids.join(',')]);
    expect(real.code).toBe(0);
    expect(real.stdout).toContain('Applied 2 links in 2 files');
    for (const patch of parsePatch(dry.stdout)) {
      const file = patch.oldFileName!.replace(/^a\/docs\//, '');
      expect(applyPatch(originals[file]!, patch)).toBe(fs.readFileSync(path.join(root, file), 'utf8'));
    }
  });

  it('applies one suggestion by id: the link in the file style, at its place; a new check shows the predicted depth and rank', async () => {
    const { cwd, root } = project();
    const report = await suggestions(cwd);
    const s = byAnchor(report, 'tuning the flame sensor');
    const original = fs.readFileSync(path.join(root, s.file), 'utf8');
    const r = await cli(cwd, ['apply', 'docs', '--ids', s.id]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(`docs/guide/install.md  link style relative (the file's own links)`);
    expect(r.stdout).toContain(`${s.line}:${s.column}  [tuning the flame sensor](tuning.md)  -> /guide/tuning/  id ${s.id}`);
    const edited = fs.readFileSync(path.join(root, s.file), 'utf8');
    expect(edited).toBe(`${original.slice(0, s.offset)}[${s.anchor}](tuning.md)${original.slice(s.endOffset)}`);
    const facts = parseSource({ path: s.file, kind: 'markdown', bytes: edited.length, hash: '', text: edited, problems: [] }, { ...DEFAULT_OPTIONS, root });
    expect(facts.links.find((l) => l.href === 'tuning.md')).toMatchObject({ text: s.anchor, line: s.line, column: s.column });

    const after = await analyze({ root, cache: { enabled: false } });
    const target = after.pages.find((p) => p.route === s.target)!;
    expect(target.depth).toBe(s.depthAfter);
    expect(target.rank).toBeCloseTo(s.targetRankAfter!, 3);
    expect(after.links.some((l) => l.from === s.source && l.to === s.target && l.status === 'ok')).toBe(true);
    expect(after.findings.some((f) => f.rule === 'orphan-page' && f.route === s.target)).toBe(false);
  });

  it('refuses a source changed since the report (naming the file), applies the rest, exits 1', async () => {
    const { cwd, root } = project();
    const report = await suggestions(cwd);
    const install = path.join(root, 'guide', 'install.md');
    fs.writeFileSync(install, `<!-- edited -->\n${fs.readFileSync(install, 'utf8')}`);
    const changed = fs.readFileSync(install);
    const r = await cli(cwd, ['apply', 'docs', '--from', 'report.json', '--all']);
    expect(r.code).toBe(1);
    const stale = byAnchor(report, 'tuning the flame sensor');
    const loose = report.suggestions.filter((x) => x.anchor === null);
    expect(loose.length).toBeGreaterThan(0);
    expect(r.stdout).toContain(`Did not apply ${1 + loose.length} suggestions:\n`);
    expect(r.stdout).toContain(`  docs/guide/install.md  id ${stale.id}: the source changed since the report`);
    for (const x of loose) expect(r.stdout).toContain(`  docs/${x.file}  id ${x.id}: no anchor phrase: needs a sentence written by hand\n`);
    expect(r.stdout).toContain('Applied 1 link in 1 file');
    expect(fs.readFileSync(install)).toEqual(changed);
    expect(fs.readFileSync(path.join(root, 'reference', 'codes.md'), 'utf8')).toContain('The [flame sensor threshold](../guide/tuning.md) is out of range.');
  });

  it('refuses a suggestion whose target page has no file or route in a hand-edited report, writing nothing for it', async () => {
    const { cwd, root } = project();
    const report = await suggestions(cwd);
    const stale = byAnchor(report, 'tuning the flame sensor');
    const forged = { ...report, pages: report.pages.map((p) => (p.route === stale.target ? { ...p, file: '' } : p)) };
    fs.writeFileSync(path.join(cwd, 'report.json'), JSON.stringify(forged));
    const install = path.join(root, 'guide', 'install.md');
    const before = fs.readFileSync(install);
    const r = await cli(cwd, ['apply', 'docs', '--from', 'report.json', '--ids', stale.id]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain(`id ${stale.id}: the target ${stale.target} is not a page of the report`);
    expect(fs.readFileSync(install)).toEqual(before);
  });

  it('exit codes: 1 for an id without an anchor, 2 for usage and bad reports, with nothing written', async () => {
    const { cwd } = project();
    const report = await suggestions(cwd);
    const loose = byAnchor(report, null);
    const before = snapshot(cwd);
    const skipped = await cli(cwd, ['apply', 'docs', '--from', 'report.json', '--ids', loose.id]);
    expect(skipped.code).toBe(1);
    expect(skipped.stdout).toContain(`Applied 0 links in 0 files\nDid not apply 1 suggestion:\n  docs/${loose.file}  id ${loose.id}: no anchor phrase: needs a sentence written by hand\n`);
    const dryLoose = await cli(cwd, ['apply', 'docs', '--from', 'report.json', '--ids', loose.id, '--dry-run']);
    expect(dryLoose.code).toBe(1);
    expect(dryLoose.stderr).toContain(`Would not apply 1 suggestion:\n  docs/${loose.file}  id ${loose.id}: no anchor phrase: needs a sentence written by hand\n`);
    const cases: [string[], RegExp][] = [
      [['apply', 'docs', '--from', 'report.json', '--ids', 'nope,also-nope'], /flag --ids: no suggestion with id "nope", "also-nope" in "report\.json"; nothing was written/],
      [['apply', 'docs'], /"apply" needs --ids ID,ID \(from the suggest output\) or --all/],
      [['apply', 'docs', '--ids', 'a', '--all'], /give one of them, not both/],
      [['apply', 'docs', '--from', 'missing.json', '--all'], /flag --from: cannot read "missing\.json": no such file/],
      [['apply', 'docs', '--all', '--format', 'json'], /^linkweave: flag --format is not taken by "apply"; its flags: /],
      [['apply', 'docs', '--all', '--link-style', 'fancy'], /flag --link-style: expected one of relative, absolute, route-relative; got "fancy"/],
    ];
    for (const [argv, message] of cases) {
      const r = await cli(cwd, argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.stderr).toMatch(message);
    }
    fs.writeFileSync(path.join(cwd, 'notes.json'), '{"schema": "linkweave/baseline@1", "findings": []}');
    const wrong = await cli(cwd, ['apply', 'docs', '--from', 'notes.json', '--all']);
    expect(wrong.code).toBe(2);
    expect(wrong.stderr).toMatch(/notes\.json: key "schema": expected "linkweave\/report@1"/);
    delete before['notes.json'];
    const after = snapshot(cwd);
    delete after['notes.json'];
    expect(after).toEqual(before);
  });
});

/** A report for `--from` with suggestions made by hand against the files of `tree`. */
function reportFor(root: string, tree: Record<string, string>, picks: { file: string; anchor: string; target: string; occurrence?: number }[]) {
  const bytes = (f: string) => Buffer.from(tree[f]!, 'utf8');
  const text = (f: string) => bytes(f).toString('utf8').replace(/^\uFEFF/, '');
  const routeOf = (f: string) => `/${f.replace(/(^|\/)index\.(md|html)$/, '$1').replace(/\.md$/, '/')}`;
  const pages = Object.keys(tree).map((f) => ({ route: routeOf(f), file: f, title: f, pagerank: 0.1, rank: 1, depth: 1, inlinks: 1, contentInlinks: 1, outlinks: 1, importance: 'normal' }));
  const suggestions = picks.map((p, i) => {
    const t = text(p.file);
    let offset = t.indexOf(p.anchor);
    for (let k = 0; k < (p.occurrence ?? 0); k++) offset = t.indexOf(p.anchor, offset + 1);
    const lines = t.slice(0, offset).split(/\r\n|\r|\n/);
    return {
      id: `id${i}`, source: routeOf(p.file), target: p.target, file: p.file, line: lines.length, column: lines[lines.length - 1]!.length + 1,
      offset, endOffset: offset + p.anchor.length, anchor: p.anchor, similarity: 0.3, score: 0.3, targetRankBefore: 0.5, targetRankAfter: 0.8,
      depthBefore: 3, depthAfter: 2, reason: '', sourceHash: createHash('sha256').update(bytes(p.file)).digest('hex'),
    };
  });
  return JSON.stringify({ schema: 'linkweave/report@1', tool: { name: 'linkweave', version: '0' }, root, pages, findings: [], suggestions });
}

describe('link style and bytes', () => {
  const SITE = {
    'index.md': '# Home\n\nSee [the guide](/guide/) and [the wiring page](/hardware/wiring/).\n\nThe wiring matters.\n',
    'guide/index.md': '# Guide\n\nThe wiring comes first; back [home](/).\n',
    'guide/notes.md': '# Notes\n\nNothing links from here yet; the wiring is in the hardware section.\n',
    'hardware/wiring.md': '# Wiring\n\nConnect the sensor.\n',
    'legacy/faq.html': '<!DOCTYPE html>\n<html><head><title>FAQ</title></head>\n<body>\n<p>Questions about the wiring.</p>\n<p>Back <a href="../">home</a>.</p>\n</body></html>\n',
  };

  it('follows the file, then the site (absolute routes here); --link-style overrides; HTML gets <a href>', async () => {
    const { cwd, root } = project(SITE);
    const picks = [
      { file: 'index.md', anchor: 'wiring', target: '/hardware/wiring/', occurrence: 2 },
      { file: 'guide/notes.md', anchor: 'wiring', target: '/hardware/wiring/' },
      { file: 'legacy/faq.html', anchor: 'wiring', target: '/hardware/wiring/' },
    ];
    fs.writeFileSync(path.join(cwd, 'r.json'), reportFor(root, SITE, picks));
    const r = await cli(cwd, ['apply', 'docs', '--from', 'r.json', '--all']);
    expect(r.code, r.stdout).toBe(0);
    const read = (f: string) => fs.readFileSync(path.join(root, f), 'utf8');
    expect(read('index.md')).toContain('The [wiring](/hardware/wiring/) matters.');
    // No links of its own: the site's links are absolute routes.
    expect(read('guide/notes.md')).toContain('the [wiring](/hardware/wiring/) is in');
    expect(r.stdout).toContain("docs/guide/notes.md  link style absolute (the site's links)");
    // The HTML page's own link is relative: a relative URL from /legacy/faq.html.
    expect(read('legacy/faq.html')).toContain('<p>Questions about the <a href="../hardware/wiring/">wiring</a>.</p>');

    const again = project(SITE);
    fs.writeFileSync(path.join(again.cwd, 'r.json'), reportFor(again.root, SITE, picks));
    expect((await cli(again.cwd, ['apply', 'docs', '--from', 'r.json', '--all', '--link-style', 'relative'])).code).toBe(0);
    expect(fs.readFileSync(path.join(again.root, 'index.md'), 'utf8')).toContain('The [wiring](hardware/wiring.md) matters.');
    expect(fs.readFileSync(path.join(again.root, 'guide/notes.md'), 'utf8')).toContain('the [wiring](../hardware/wiring.md) is in');
  });

  it('keeps a BOM, CRLF line endings and non-ASCII text byte for byte', async () => {
    const text = '\uFEFF# Grüße\r\n\r\nÜber die Verkabelung: siehe wiring — naïve café.\r\n';
    const tree = { 'de.md': text, 'hardware/wiring.md': '# Wiring\n' };
    const { cwd, root } = project(tree);
    fs.writeFileSync(path.join(cwd, 'r.json'), reportFor(root, tree, [{ file: 'de.md', anchor: 'wiring', target: '/hardware/wiring/' }]));
    const r = await cli(cwd, ['apply', 'docs', '--from', 'r.json', '--ids', 'id0']);
    expect(r.code).toBe(0);
    expect(fs.readFileSync(path.join(root, 'de.md'))).toEqual(Buffer.from(text.replace('siehe wiring', 'siehe [wiring](hardware/wiring.md)'), 'utf8'));
  });

  it('refuses a report path outside the root or not a source, without reading it', async () => {
    const { cwd, root } = project(SITE);
    const report = JSON.parse(reportFor(root, SITE, [{ file: 'index.md', anchor: 'wiring', target: '/hardware/wiring/' }])) as { suggestions: Suggestion[] };
    fs.writeFileSync(path.join(cwd, 'secret.md'), 'wiring');
    const evil = ['../secret.md', '/etc/passwd.md', 'guide/../../secret.md', 'notes.txt'].map((file, i) => ({ ...report.suggestions[0]!, id: `e${i}`, file }));
    fs.writeFileSync(path.join(cwd, 'r.json'), JSON.stringify({ ...report, suggestions: evil }));
    const r = await cli(cwd, ['apply', 'docs', '--from', 'r.json', '--all']);
    expect(r.code).toBe(1);
    expect(r.stdout.match(/is not the path of a source file under the content root/g)).toHaveLength(4);
    expect(fs.readFileSync(path.join(cwd, 'secret.md'), 'utf8')).toBe('wiring');
  });
});

describe('refusals a dry run lists', () => {
  const SITE = {
    'index.md': '# Home\n\nSee [the guide](/guide/).\n',
    'guide.md':
      '---\ntitle: Guide\n---\n\n# Guide\n\nThe {{< feature url="/status/" title="status page" >}} here.\n\nRead the status page daily.\n\n<!-- status page -->\n',
    'status.md': '# Status page\n\nAll fine.\n',
  };

  it('--all --dry-run: each suggestion it will not apply, with the reason in plain words; nothing written', async () => {
    const { cwd, root } = project(SITE);
    const picks = [
      { file: 'guide.md', anchor: 'status page', target: '/status/' },
      { file: 'guide.md', anchor: 'status page', target: '/status/', occurrence: 1 },
      { file: 'guide.md', anchor: 'status page', target: '/status/', occurrence: 2 },
    ];
    const report = JSON.parse(reportFor(root, SITE, picks)) as { suggestions: Suggestion[] };
    const loose = { ...report.suggestions[0]!, id: 'loose', anchor: null, offset: -1, endOffset: -1 };
    const stale = { ...report.suggestions[1]!, id: 'stale', sourceHash: '0'.repeat(64) };
    fs.writeFileSync(path.join(cwd, 'r.json'), JSON.stringify({ ...report, suggestions: [...report.suggestions, loose, stale] }));
    const before = snapshot(cwd);
    const r = await cli(cwd, ['apply', 'docs', '--from', 'r.json', '--all', '--dry-run']);
    expect(r.code).toBe(1);
    expect(snapshot(cwd)).toEqual(before);
    expect(r.stdout).toContain('+Read the [status page](/status/) daily.\n');
    expect(r.stderr).toBe(
      [
        'Would apply 1 link in 1 file (dry run: nothing written)',
        '  docs/guide.md  link style absolute (the site\'s links)',
        '    9:10  [status page](/status/)  -> /status/  id id1',
        'Would not apply 4 suggestions:',
        '  docs/guide.md  id id0: inside a shortcode (line 7)',
        '  docs/guide.md  id id2: inside an HTML comment (line 11)',
        '  docs/guide.md  id loose: no anchor phrase: needs a sentence written by hand',
        `  docs/guide.md  id stale: the source changed since the report (content hash 000000000000, now ${report.suggestions[0]!.sourceHash.slice(0, 12)}); run "linkweave suggest" again`,
        '',
      ].join('\n'),
    );
  });

  it('--all with nothing it can apply exits 1, not a silent "Applied 0 links"', async () => {
    const { cwd, root } = project(SITE);
    const report = JSON.parse(reportFor(root, SITE, [{ file: 'guide.md', anchor: 'status page', target: '/status/' }])) as { suggestions: Suggestion[] };
    const loose = { ...report.suggestions[0]!, id: 'loose', anchor: null, offset: -1, endOffset: -1 };
    fs.writeFileSync(path.join(cwd, 'r.json'), JSON.stringify({ ...report, suggestions: [loose] }));
    const r = await cli(cwd, ['apply', 'docs', '--from', 'r.json', '--all']);
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('Applied 0 links in 0 files\nDid not apply 1 suggestion:\n  docs/guide.md  id loose: no anchor phrase: needs a sentence written by hand\n');
  });
});
