import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { build } from 'rolldown';
import { afterEach, describe, expect, it } from 'vitest';
import { collectSources } from '../../src/collect/index.js';
import { EngineError } from '../../src/errors.js';
import { resolveOptions } from '../../src/config/options.js';
import type { Config } from '../../src/config/options.js';
import { tempDir, writeTree } from './tree.js';
import type { Tree } from './tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

function site(tree: Tree): string {
  const t = tempDir();
  cleanups.push(t.cleanup);
  writeTree(t.dir, tree);
  return t.dir;
}

async function collect(root: string, config: Config = {}, extra?: string[]) {
  return collectSources(resolveOptions(config, root), extra);
}

/** collect-main.ts bundled into one file and run as the user nobody (uid 65534) on `root`. */
async function collectAsNobody(root: string): Promise<{ files: { path: string }[]; warnings: unknown[] }> {
  const out = tempDir('linkweave-nobody-');
  cleanups.push(out.cleanup);
  const bundle = path.join(out.dir, 'collect.mjs');
  await build({ input: path.join(import.meta.dirname, 'collect-main.ts'), platform: 'node', output: { file: bundle, format: 'esm' }, logLevel: 'silent' });
  for (const dir of [out.dir, root]) fs.chmodSync(dir, 0o755);
  const r = spawnSync(process.execPath, [bundle, root], { uid: 65534, gid: 65534, encoding: 'utf8' });
  expect(r.stderr).toBe('');
  const parsed = JSON.parse(r.stdout) as { files: string[]; warnings: unknown[] };
  return { files: parsed.files.map((p) => ({ path: p })), warnings: parsed.warnings };
}

const sha256 = (s: string | Uint8Array) => createHash('sha256').update(s).digest('hex');

describe('collectSources', () => {
  it('finds sources by extension with kind, size and sha256 of the bytes', async () => {
    const root = site({
      'index.md': '# Home\n',
      'guide/setup.markdown': 'Setup ünïcode\n',
      'guide/widget.mdx': '<Widget />\n',
      'legacy/old.html': '<title>Old</title>',
      'legacy/older.HTM': '<p>x</p>',
      'img/logo.png': new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0]),
      'notes.txt': 'plain',
    });
    const result = await collect(root);
    expect(result.files.map((f) => [f.path, f.kind])).toEqual([
      ['guide/setup.markdown', 'markdown'],
      ['guide/widget.mdx', 'markdown'],
      ['index.md', 'markdown'],
      ['legacy/old.html', 'html'],
    ]);
    const setup = result.files.find((f) => f.path === 'guide/setup.markdown')!;
    // Hash and size checked against node:crypto and the byte length of the UTF-8 encoding.
    expect(setup.hash).toBe(sha256(Buffer.from('Setup ünïcode\n', 'utf8')));
    expect(setup.bytes).toBe(Buffer.byteLength('Setup ünïcode\n'));
    expect(setup.text).toBe('Setup ünïcode\n');
    expect(setup.problems).toEqual([]);
    // Globs are case-sensitive: the default include does not match `.HTM`, so it is an asset.
    expect(result.assets).toEqual(['img/logo.png', 'legacy/older.HTM', 'notes.txt']);
    expect(result.warnings).toEqual([]);
    const upper = await collect(root, { include: ['**/*.HTM'] });
    expect(upper.files.map((f) => [f.path, f.kind])).toEqual([['legacy/older.HTM', 'html']]);
  });

  it('a file matched by include without a source extension is an asset, not a source', async () => {
    const root = site({ 'a.md': 'a', 'b.txt': 'b' });
    const result = await collect(root, { include: ['**/*'] });
    expect(result.files.map((f) => f.path)).toEqual(['a.md']);
    expect(result.assets).toEqual(['b.txt']);
  });

  it('leaves out node_modules, dot-folders, dot-files and the exclude globs', async () => {
    const root = site({
      'a.md': 'a',
      'node_modules/pkg/readme.md': 'dep',
      'sub/node_modules/x.md': 'dep',
      '.vitepress/config.md': 'hidden',
      'docs/.draft.md': 'hidden',
      'drafts/wip.md': 'wip',
      'drafts/keep.png': 'png',
    });
    const result = await collect(root, { exclude: ['drafts/**'] });
    expect(result.files.map((f) => f.path)).toEqual(['a.md']);
    expect(result.assets).toEqual([]);
  });

  it('even an explicit include cannot pull in node_modules or dot-folders', async () => {
    const root = site({ '.hidden/a.md': 'a', 'node_modules/b.md': 'b', 'c.md': 'c' });
    const result = await collect(root, { include: ['**/*.md', '.hidden/*.md', 'node_modules/*.md'] });
    expect(result.files.map((f) => f.path)).toEqual(['c.md']);
  });

  it('honours extra exclusions given as relative or absolute paths', async () => {
    const root = site({ 'a.md': 'a', 'toc.md': '- [A](a.md)', 'out/report.html': '<p>' });
    const result = await collect(root, {}, ['toc.md', path.join(root, 'out/report.html')]);
    expect(result.files.map((f) => f.path)).toEqual(['a.md']);
  });

  it('refuses globs that climb out of the root, naming the key', async () => {
    const root = site({ 'a.md': 'a' });
    await expect(collect(root, { include: ['../**/*.md'] })).rejects.toThrow(/key "include\.0": glob "\.\.\/\*\*\/\*\.md" leaves the content root/);
    await expect(collect(root, { exclude: ['/etc/**'] })).rejects.toThrow(/key "exclude\.0"/);
  });

  it('throws E_NO_ROOT for a missing root or a root that is a file', async () => {
    const root = site({ 'a.md': 'a' });
    const missing = collect(path.join(root, 'nope'));
    await expect(missing).rejects.toBeInstanceOf(EngineError);
    await expect(missing).rejects.toMatchObject({ code: 'E_NO_ROOT' });
    await expect(collect(path.join(root, 'a.md'))).rejects.toMatchObject({ code: 'E_NO_ROOT', message: expect.stringContaining('is not a folder') });
  });

  it('follows a symlink that stays inside the root', async () => {
    const root = site({
      'shared/part.md': 'shared text',
      'guide/part-link.md': { symlink: '../shared/part.md' },
      'guide/common': { symlink: '../shared' },
    });
    const result = await collect(root);
    expect(result.files.map((f) => [f.path, f.text])).toEqual([
      ['guide/common/part.md', 'shared text'],
      ['guide/part-link.md', 'shared text'],
      ['shared/part.md', 'shared text'],
    ]);
    expect(result.warnings).toEqual([]);
  });

  it('skips symlinks to files and folders outside the root with a warning; the canary never appears', async () => {
    const outside = tempDir('linkweave-outside-');
    cleanups.push(outside.cleanup);
    const canary = 'CANARY-7f3c9e outside the root';
    writeTree(outside.dir, { 'secret.md': canary, 'dir/more.md': canary, 'dir/pic.png': canary });
    const root = site({
      'index.md': '# Home',
      'leak.md': { symlink: path.join(outside.dir, 'secret.md') },
      'docs/leakdir': { symlink: path.join(outside.dir, 'dir') },
      'docs/rel-leak.md': { symlink: '../../' + path.basename(outside.dir) + '/secret.md' },
    });
    const result = await collect(root);
    expect(result.files.map((f) => f.path)).toEqual(['index.md']);
    expect(result.assets).toEqual([]);
    expect(result.warnings.map((w) => [w.file, w.code])).toEqual([
      ['docs/leakdir', 'symlink-outside'],
      ['docs/rel-leak.md', 'symlink-outside'],
      ['leak.md', 'symlink-outside'],
    ]);
    expect(JSON.stringify(result)).not.toContain('CANARY-7f3c9e');
  });

  it('terminates on symlink loops and reports them', async () => {
    const root = site({
      'a/page.md': 'a',
      'b/page.md': 'b',
      'a/to-b': { symlink: '../b' },
      'b/to-a': { symlink: '../a' },
      'c/up': { symlink: '..' },
      'c/self': { symlink: 'self' },
      'c/page.md': 'c',
    });
    const result = await collect(root);
    // Each folder is entered through at most one link that does not lead back to an ancestor.
    expect(result.files.map((f) => f.path)).toEqual(['a/page.md', 'a/to-b/page.md', 'b/page.md', 'b/to-a/page.md', 'c/page.md']);
    expect(result.warnings.map((w) => [w.file, w.code])).toEqual([
      ['a/to-b/to-a', 'symlink-loop'],
      ['b/to-a/to-b', 'symlink-loop'],
      ['c/self', 'symlink-loop'],
      ['c/up', 'symlink-loop'],
    ]);
  });

  it('strips a UTF-8 BOM', async () => {
    const root = site({ 'bom.md': Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('# Title\n')]) });
    const [file] = (await collect(root)).files;
    expect(file!.text).toBe('# Title\n');
    expect(file!.bytes).toBe(11);
    expect(file!.problems).toEqual([]);
  });

  it('reports invalid UTF-8 with its line, decodes with U+FFFD and goes on', async () => {
    const bad = Buffer.concat([Buffer.from('line one\r\nline two\nab'), Buffer.from([0xc3, 0x28]), Buffer.from(' rest\n')]);
    const root = site({ 'bad.md': bad, 'good.md': 'fine' });
    const result = await collect(root);
    expect(result.files.map((f) => f.path)).toEqual(['bad.md', 'good.md']);
    const file = result.files[0]!;
    expect(file.text).toBe('line one\r\nline two\nab\uFFFD( rest\n');
    expect(file.problems).toMatchObject([{ code: 'invalid-utf8', line: 3, column: 3 }]);
    expect(file.hash).toBe(sha256(bad));
  });

  it('marks a binary file with a source extension and keeps its text empty', async () => {
    const root = site({ 'image.md': new Uint8Array([0x47, 0x49, 0x46, 0x38, 0x00, 0x01, 0x02]) });
    const [file] = (await collect(root)).files;
    expect(file!.text).toBe('');
    expect(file!.problems.map((p) => p.code)).toEqual(['binary']);
    expect(file!.bytes).toBe(7);
  });

  it('does not decode a file over maxFileBytes but still hashes all of its bytes', async () => {
    const big = 'x'.repeat(5000);
    const root = site({ 'big.md': big, 'small.md': 'ok' });
    const result = await collect(root, { maxFileBytes: 4096 });
    const file = result.files.find((f) => f.path === 'big.md')!;
    expect(file.text).toBe('');
    expect(file.bytes).toBe(5000);
    expect(file.hash).toBe(sha256(big));
    expect(file.problems).toMatchObject([{ code: 'too-large', message: expect.stringContaining('over maxFileBytes (4096)') }]);
    expect(result.files.find((f) => f.path === 'small.md')!.text).toBe('ok');
  });

  it('gives the same sorted output whatever order the files were created in', async () => {
    const names = ['z.md', 'a/b.md', 'A.md', 'a.md', 'a-b.md', 'a/a.md', 'b/index.md', 'ä.md', 'x.png', 'a/c.jpg'];
    const forward = site(Object.fromEntries(names.map((n) => [n, n])));
    const backward = site(Object.fromEntries([...names].reverse().map((n) => [n, n])));
    const one = await collect(forward);
    const two = await collect(backward);
    // Code-unit order: upper case before lower case, '-' before '.' before '/'.
    expect(one.files.map((f) => f.path)).toEqual(['A.md', 'a-b.md', 'a.md', 'a/a.md', 'a/b.md', 'b/index.md', 'z.md', 'ä.md']);
    expect(two.files).toEqual(one.files);
    expect(one.assets).toEqual(['a/c.jpg', 'x.png']);
    expect(two.assets).toEqual(one.assets);
  });

  it('reads many files in batches and keeps every one, in order', async () => {
    const tree: Tree = {};
    for (let i = 0; i < 150; i++) tree[`p/${String(i).padStart(3, '0')}.md`] = `page ${i}`;
    const result = await collect(site(tree));
    expect(result.files).toHaveLength(150);
    expect(result.files[149]!.text).toBe('page 149');
  });

  it('a FIFO named like a page does not hang the run', async () => {
    const root = site({ 'index.md': '# Home' });
    expect(spawnSync('mkfifo', [path.join(root, 'pipe.md')]).status).toBe(0);
    const result = await collect(root);
    // The listing leaves out what is not a regular file (read.test.ts covers a FIFO met when reading).
    expect(result.files.map((f) => f.path)).toEqual(['index.md']);
    expect(result.assets).toEqual([]);
    expect(result.warnings).toEqual([]);
  });

  // The superuser reads every file whatever its mode, and CI runs as root: the collector is then
  // bundled into one file (rolldown) and run as the user "nobody", for whom the mode counts.
  it('a file that cannot be read gives a warning and the run goes on', async () => {
    const root = site({ 'locked.md': 'x', 'open.md': 'y' });
    fs.chmodSync(path.join(root, 'locked.md'), 0o000);
    const result = process.getuid?.() === 0 ? await collectAsNobody(root) : await collect(root);
    expect(result.files.map((f) => f.path)).toEqual(['open.md']);
    expect(result.warnings).toMatchObject([{ file: 'locked.md', code: 'unreadable' }]);
  });
});

describe('collectSources with the default include', () => {
  it('finds the same sources and assets as the same globs written out (one walk instead of two)', async () => {
    const root = site({
      'index.md': '# Home\n',
      'guide/a.markdown': 'a',
      'guide/b.mdx': 'b',
      'guide/deep/c.html': '<p>c</p>',
      'guide/deep/d.htm': '<p>d</p>',
      'UPPER.MD': 'not a source by the glob',
      'notes.md.txt': 'an asset',
      'img/logo.png': 'png',
      'md': 'no extension',
      '.hidden/e.md': 'dot folder',
      '.f.md': 'dot file',
      'node_modules/pkg/g.md': 'dependency',
      'guide/skip.md': 'excluded',
      'guide/link.md': { symlink: 'a.markdown' },
    });
    const byDefault = await collect(root, { exclude: ['guide/skip.md'] });
    const spelled = await collect(root, { exclude: ['guide/skip.md'], include: ['**/*.md', '**/*.markdown', '**/*.mdx', '**/*.html', '**/*.htm'] });
    // The first is the case of one walk: the default include is the source glob itself.
    expect(resolveOptions({}, root).include).toEqual(['**/*.{md,markdown,mdx,html,htm}']);
    expect(byDefault.files.map((f) => f.path)).toEqual(['guide/a.markdown', 'guide/b.mdx', 'guide/deep/c.html', 'guide/deep/d.htm', 'guide/link.md', 'index.md']);
    expect(byDefault).toEqual(spelled);
  });
});

