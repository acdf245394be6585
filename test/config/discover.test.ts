import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadConfig } from '../../src/config/discover.js';
import { resolveOptions } from '../../src/config/options.js';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Tree } from '../collect/tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

/** A project folder (the working folder) with a content root `docs/` inside. */
function project(tree: Tree): { cwd: string; root: string } {
  const t = tempDir();
  cleanups.push(t.cleanup);
  writeTree(t.dir, { 'docs/index.md': '# Home', ...tree });
  return { cwd: t.dir, root: path.join(t.dir, 'docs') };
}

describe('loadConfig', () => {
  it('uses --config (JSON) and names the file relative to the working folder', async () => {
    const { cwd, root } = project({ 'conf/lw.json': '{"maxDepth": 5}' });
    const loaded = await loadConfig({ explicit: 'conf/lw.json', root, cwd });
    expect(loaded).toEqual({ config: { maxDepth: 5 }, origin: 'conf/lw.json', file: path.join(cwd, 'conf/lw.json') });
  });

  it('loads the default export of an .mjs file', async () => {
    const { cwd, root } = project({ 'lw.config.mjs': 'export default { entry: ["/start/"], maxDepth: 2 };\n' });
    const loaded = await loadConfig({ explicit: 'lw.config.mjs', root, cwd });
    expect(loaded.config).toEqual({ entry: ['/start/'], maxDepth: 2 });
  });

  it('looks in the content root first, then in the working folder', async () => {
    const both = project({ 'docs/linkweave.config.json': '{"maxDepth": 1}', 'linkweave.config.json': '{"maxDepth": 2}' });
    expect(await loadConfig({ explicit: null, ...both })).toMatchObject({ config: { maxDepth: 1 }, origin: 'docs/linkweave.config.json' });
    const cwdOnly = project({ 'linkweave.config.mjs': 'export default { maxDepth: 4 };' });
    expect(await loadConfig({ explicit: null, ...cwdOnly })).toMatchObject({ config: { maxDepth: 4 }, origin: 'linkweave.config.mjs' });
  });

  it('falls back to package.json#linkweave, then to defaults', async () => {
    const pkg = project({ 'package.json': JSON.stringify({ name: 'site', linkweave: { failOn: 'warning' } }) });
    expect(await loadConfig({ explicit: null, ...pkg })).toMatchObject({ config: { failOn: 'warning' }, origin: 'package.json#linkweave' });
    const plain = project({ 'package.json': JSON.stringify({ name: 'site' }) });
    expect(await loadConfig({ explicit: null, ...plain })).toEqual({ config: {}, origin: 'defaults', file: null });
  });

  it('a config file beats package.json#linkweave', async () => {
    const p = project({ 'package.json': '{"linkweave": {"maxDepth": 9}}', 'docs/linkweave.config.json': '{"maxDepth": 3}' });
    expect((await loadConfig({ explicit: null, ...p })).config).toEqual({ maxDepth: 3 });
  });

  it('two config files side by side is an error naming both', async () => {
    const p = project({ 'linkweave.config.json': '{}', 'linkweave.config.mjs': 'export default {}' });
    await expect(loadConfig({ explicit: null, ...p })).rejects.toMatchObject({
      code: 'E_CONFIG_INVALID',
      message: '"linkweave.config.json" and "linkweave.config.mjs" both exist; keep one configuration file',
    });
  });

  it.each([
    ['invalid JSON', { 'bad.json': '{"maxDepth": 3,}' }, 'bad.json', /^bad\.json: not valid JSON: /],
    ['a module that throws', { 'bad.mjs': 'throw new Error("boom");' }, 'bad.mjs', /^bad\.mjs: cannot load: boom$/],
    ['a module without default export', { 'nodefault.mjs': 'export const x = 1;' }, 'nodefault.mjs', /^nodefault\.mjs: no default export/],
  ] as const)('%s is E_CONFIG_INVALID naming the file', async (_name, tree, file, message) => {
    const p = project(tree);
    await expect(loadConfig({ explicit: file, ...p })).rejects.toMatchObject({ code: 'E_CONFIG_INVALID', message: expect.stringMatching(message) });
  });

  it('a missing --config file is E_IO; a wrong extension is E_USAGE', async () => {
    const p = project({});
    await expect(loadConfig({ explicit: 'nope.json', ...p })).rejects.toMatchObject({ code: 'E_IO', message: 'flag --config: cannot read "nope.json": no such file' });
    await expect(loadConfig({ explicit: 'conf.yaml', ...p })).rejects.toMatchObject({ code: 'E_USAGE', message: expect.stringContaining('expected a .json, .mjs, .js or .cjs file') });
  });

  it('the loaded object is validated by resolveOptions with the file as origin', async () => {
    const p = project({ 'docs/linkweave.config.json': '{"maxDepht": 3}' });
    const loaded = await loadConfig({ explicit: null, ...p });
    expect(() => resolveOptions(loaded.config, p.root, loaded.origin)).toThrow('docs/linkweave.config.json: key "maxDepht": unknown key; accepted keys: include, exclude, routes,');
  });
});
