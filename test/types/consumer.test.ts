/**
 * The public types as a consumer gets them: test/types/consumer.ts, with its source imports
 * rewritten to the package entry points, compiled by `tsc --noEmit` (strict, NodeNext,
 * exactOptionalPropertyTypes) in a temp project where linkweave is installed as a package
 * (a link to this repository, whose `exports` map points at the built `dist/`).
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const repo = path.resolve(import.meta.dirname, '../..');
const temp = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-types-'));
afterAll(() => fs.rmSync(temp, { recursive: true, force: true }));

const ENTRY_POINTS: Record<string, string> = {
  '../../src/index.js': 'linkweave',
  '../../src/plugins/unified.js': 'linkweave/unified',
  '../../src/plugins/vite.js': 'linkweave/vite',
  '../../src/plugins/rollup.js': 'linkweave/rollup',
};

/** A project with linkweave (and what the consumer file imports) in node_modules. */
function consumerProject(name: string, source: string): string {
  const dir = path.join(temp, name);
  fs.mkdirSync(path.join(dir, 'node_modules/@types'), { recursive: true });
  fs.symlinkSync(repo, path.join(dir, 'node_modules/linkweave'), 'dir');
  for (const dep of ['unified', 'remark-parse', 'vfile', 'vite', 'rolldown', '@types/node']) {
    fs.symlinkSync(path.join(repo, 'node_modules', dep), path.join(dir, 'node_modules', dep), 'dir');
  }
  fs.writeFileSync(path.join(dir, 'package.json'), JSON.stringify({ name: `consumer-${name}`, private: true, type: 'module' }));
  const compilerOptions = {
    target: 'ES2022',
    module: 'NodeNext',
    moduleResolution: 'NodeNext',
    strict: true,
    exactOptionalPropertyTypes: true,
    verbatimModuleSyntax: true,
    skipLibCheck: true,
    noEmit: true,
    types: ['node'],
  };
  fs.writeFileSync(path.join(dir, 'tsconfig.json'), JSON.stringify({ compilerOptions, files: ['consumer.ts'] }));
  fs.writeFileSync(path.join(dir, 'consumer.ts'), source);
  return dir;
}

function tsc(dir: string): { status: number | null; output: string } {
  const bin = path.join(repo, 'node_modules/typescript/bin/tsc');
  const result = spawnSync(process.execPath, [bin, '-p', path.join(dir, 'tsconfig.json')], { cwd: dir, encoding: 'utf8' });
  return { status: result.status, output: `${result.stdout}${result.stderr}` };
}

/** consumer.ts with its source imports replaced by the package's entry points. */
function asPackageConsumer(): string {
  let source = fs.readFileSync(path.join(repo, 'test/types/consumer.ts'), 'utf8');
  for (const [from, to] of Object.entries(ENTRY_POINTS)) source = source.replaceAll(`'${from}'`, `'${to}'`);
  return source;
}

describe('public types through the package entry points', () => {
  it('every entry point of the exports map has built declarations and code', () => {
    const pkg = JSON.parse(fs.readFileSync(path.join(repo, 'package.json'), 'utf8')) as {
      exports: Record<string, string | { types: string; import: string }>;
    };
    for (const entry of ['.', './unified', './vite', './rollup']) {
      const target = pkg.exports[entry];
      expect(typeof target === 'object' && target !== null, entry).toBe(true);
      const { types, import: code } = target as { types: string; import: string };
      expect(fs.existsSync(path.join(repo, types)), `${entry} types ${types}`).toBe(true);
      expect(fs.existsSync(path.join(repo, code)), `${entry} import ${code}`).toBe(true);
    }
  });

  it('test/types/consumer.ts compiles against the built package (every @ts-expect-error used)', () => {
    const source = asPackageConsumer();
    expect(source).not.toMatch(/from '\.\.\/\.\.\/src\//);
    for (const name of Object.values(ENTRY_POINTS)) expect(source).toContain(`from '${name}'`);
    const { status, output } = tsc(consumerProject('ok', source));
    expect(output).toBe('');
    expect(status).toBe(0);
  });

  it('the same compile fails on a wrong option type without its @ts-expect-error', () => {
    const source = asPackageConsumer().replace("  // @ts-expect-error maxDepth is a number, not a string\n", '');
    const { status, output } = tsc(consumerProject('wrong', source));
    expect(status).not.toBe(0);
    expect(output).toMatch(/consumer\.ts\(\d+,\d+\): error TS2322: Type 'string' is not assignable to type 'number'/);
  });
});
