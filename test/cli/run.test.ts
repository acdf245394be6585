/**
 * `run()` in-process, for what a child process without a terminal cannot show: colour on a
 * TTY and NO_COLOR, the progress display, DEBUG stacks and temp-file tracking.
 */
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.js';
import { run } from '../../src/cli/run.js';
import { tempDir, writeTree } from '../collect/tree.js';
import type { Tree } from '../collect/tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

const SITE: Tree = {
  'docs/index.md': '# Home\n\n[Guide](guide.md)\n',
  'docs/guide.md': '# Guide\n\n[Home](index.md) and [gone](gone.md)\n',
};

function setup(tree: Tree = SITE) {
  const t = tempDir('linkweave-run-');
  cleanups.push(t.cleanup);
  writeTree(t.dir, tree);
  return t.dir;
}

async function runIn(cwd: string, argv: string[], over: Partial<CliIo> = {}) {
  let stdout = '';
  let stderr = '';
  const code = await run(argv, {
    stdout: { write: (s: string) => (stdout += s) },
    stderr: { write: (s: string) => (stderr += s) },
    cwd,
    env: {},
    isTTY: false,
    ...over,
  });
  return { code, stdout, stderr };
}

const ESC = '\x1b[';

describe('run', () => {
  it('colours the text report only on a terminal and never with NO_COLOR', async () => {
    const cwd = setup();
    const tty = await runIn(cwd, ['check', 'docs'], { isTTY: true });
    expect(tty.code).toBe(1);
    expect(tty.stdout).toContain(ESC);
    const noColor = await runIn(cwd, ['check', 'docs'], { isTTY: true, env: { NO_COLOR: '1' } });
    expect(noColor.stdout).not.toContain(ESC);
    // Same text apart from the colour codes.
    expect(tty.stdout.replace(/\x1b\[[0-9;]*m/g, '')).toBe(noColor.stdout);
    const piped = await runIn(cwd, ['check', 'docs']);
    expect(piped.stdout).toBe(noColor.stdout);
  });

  it('shows file paths relative to the working folder', async () => {
    const cwd = setup();
    const r = await runIn(cwd, ['check', 'docs']);
    expect(r.stdout).toContain('docs/guide.md:3:');
  });

  it('draws progress on a terminal stderr, and not with --no-progress or --quiet', async () => {
    const cwd = setup();
    const shown = await runIn(cwd, ['check', 'docs', '--format', 'json'], { stderrIsTTY: true });
    expect(shown.stderr).toContain('linkweave: collect');
    expect(shown.stderr.endsWith('\r\x1b[2K')).toBe(true);
    expect((await runIn(cwd, ['check', 'docs', '--format', 'json', '--no-progress'], { stderrIsTTY: true })).stderr).toBe('');
    expect((await runIn(cwd, ['check', 'docs', '--format', 'json', '--quiet'], { stderrIsTTY: true })).stderr).toBe('');
  });

  it('tracks the temp file of the report write and forgets it afterwards', async () => {
    const cwd = setup();
    const added: string[] = [];
    const live = new Set<string>();
    const tempFiles = { add: (p: string) => (added.push(p), live.add(p)), delete: (p: string) => live.delete(p) };
    const r = await runIn(cwd, ['check', 'docs', '--output', 'out/r.json', '--quiet'], { tempFiles });
    expect(r.code).toBe(1);
    expect(added).toHaveLength(1);
    expect(path.dirname(added[0]!)).toBe(path.join(cwd, 'out'));
    expect(live.size).toBe(0);
  });

  it('prints one line per error, and the stack with DEBUG=linkweave', async () => {
    const cwd = setup({ ...SITE, 'linkweave.config.json': '{"maxDepth": -1}' });
    const plain = await runIn(cwd, ['check', 'docs']);
    expect(plain.code).toBe(2);
    expect(plain.stderr.split('\n').filter(Boolean)).toEqual([expect.stringMatching(/^linkweave: linkweave\.config\.json: key "maxDepth": /)]);
    const debug = await runIn(cwd, ['check', 'docs'], { env: { DEBUG: 'linkweave' } });
    expect(debug.code).toBe(2);
    expect(debug.stderr.split('\n').filter(Boolean).length).toBeGreaterThan(2);
    expect(debug.stderr).toMatch(/\n\s+at /);
  });
});
