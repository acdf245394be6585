/**
 * The page's script is bundled from `src/report/html/client/` by scripts/build-client.mjs and
 * committed as `src/report/html/client.generated.ts`. These tests fail when the committed
 * constant is not what the modules give (run `npm run build` and commit it), and check that
 * the generated module carries the bundle's text to the byte.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CLIENT_SCRIPT } from '../../src/report/html/client.generated.js';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const script = path.join(repo, 'scripts', 'build-client.mjs');

interface BuildClient {
  bundleClient(): Promise<string>;
  generatedModule(script: string): string;
}

const load = async (): Promise<BuildClient> => (await import(pathToFileURL(script).href)) as BuildClient;

describe('the bundled page script', () => {
  it('is what the client modules give today (else: npm run build, and commit the file)', async () => {
    const { bundleClient } = await load();
    const bundled = await bundleClient();
    expect(CLIENT_SCRIPT === bundled, 'src/report/html/client.generated.ts is stale: run `npm run build` and commit it').toBe(true);
  });

  it('--check exits 0 on the committed file and 1 when it differs, writing nothing', () => {
    expect(spawnSync(process.execPath, [script, '--check'], { cwd: repo, encoding: 'utf8' }).status).toBe(0);
    const file = path.join(repo, 'src', 'report', 'html', 'client.generated.ts');
    const before = fs.readFileSync(file, 'utf8');
    // A copy of the repository's scripts and sources in a temporary folder, with one byte of the
    // generated file changed, so the check runs on a stale file without touching this one.
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-client-'));
    try {
      fs.cpSync(path.join(repo, 'scripts'), path.join(dir, 'scripts'), { recursive: true });
      fs.cpSync(path.join(repo, 'src'), path.join(dir, 'src'), { recursive: true });
      fs.symlinkSync(path.join(repo, 'node_modules'), path.join(dir, 'node_modules'), 'dir');
      const copy = path.join(dir, 'src', 'report', 'html', 'client.generated.ts');
      expect(spawnSync(process.execPath, [path.join(dir, 'scripts', 'build-client.mjs'), '--check'], { cwd: dir, encoding: 'utf8' }).status).toBe(0);
      fs.writeFileSync(copy, before.replace('"data-ready"', '"data-done"'));
      const stale = spawnSync(process.execPath, [path.join(dir, 'scripts', 'build-client.mjs'), '--check'], { cwd: dir, encoding: 'utf8' });
      expect(stale.status).toBe(1);
      expect(stale.stderr).toBe('src/report/html/client.generated.ts is not what src/report/html/client/ gives; run `npm run build` and commit it\n');
      expect(fs.readFileSync(copy, 'utf8')).toContain('"data-done"');
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
    expect(fs.readFileSync(file, 'utf8')).toBe(before);
  });

  it('the generated module gives back the script exactly, backslashes, backticks and ${ included', async () => {
    const { generatedModule } = await load();
    const text = 'const a = `x${1}` + "\\u2013\\n" + String.raw`\\${}`; // \u2013 \\`';
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-client-'));
    try {
      // The module is TypeScript only in its name: its text is plain JavaScript.
      const file = path.join(dir, 'generated.mjs');
      fs.writeFileSync(file, generatedModule(text));
      const mod = (await import(pathToFileURL(file).href)) as { CLIENT_SCRIPT: string };
      expect(mod.CLIENT_SCRIPT).toBe(text);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });

  it('is one strict function scope that says when the page is ready', () => {
    expect(CLIENT_SCRIPT.startsWith('"use strict";\n')).toBe(true);
    expect(CLIENT_SCRIPT).toContain('(function() {');
    expect(CLIENT_SCRIPT.trimEnd().endsWith('})();')).toBe(true);
    // Nothing in it could end the inline script element early.
    expect(CLIENT_SCRIPT).not.toMatch(/<\/script/i);
    expect(CLIENT_SCRIPT).toContain('document.documentElement.setAttribute("data-ready", "true")');
  });
});
