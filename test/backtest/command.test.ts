/**
 * `linkweave backtest` through the CLI's `run()` (in process, real files in a temp folder):
 * flag checks (exit 2, one line naming the flag and the accepted values), help, and the
 * outputs on a small site.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { parseBacktestFlags } from '../../src/cli/backtest-flags.js';
import { run } from '../../src/cli/run.js';
import { tempDir, writeTree } from '../collect/tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

/** Six pages about two topics, each page linked from two others. */
const SITE = {
  'docs/index.md': '# Home\n\nStart with [Cache eviction](cache/eviction.md) or [Queue retries](queue/retries.md).\n',
  'docs/cache/eviction.md': '# Cache eviction\n\nEviction drops cold cache entries. See [Cache warming](warming.md) and [Cache sizing](sizing.md).\n',
  'docs/cache/warming.md': '# Cache warming\n\nWarming fills the cache before traffic. Read [Cache eviction](eviction.md) and [Cache sizing](sizing.md).\n',
  'docs/cache/sizing.md': '# Cache sizing\n\nSizing the cache bounds eviction and warming. See [Cache warming](warming.md), [home](../index.md).\n',
  'docs/queue/retries.md': '# Queue retries\n\nRetries resend failed queue messages. See [Dead letters](dead-letters.md) and [home](../index.md).\n',
  'docs/queue/dead-letters.md': '# Dead letters\n\nDead letters keep queue messages whose retries failed. See [Queue retries](retries.md), [Cache eviction](../cache/eviction.md).\n',
};

function project() {
  const t = tempDir('linkweave-backtest-cli-');
  cleanups.push(t.cleanup);
  writeTree(t.dir, SITE);
  return t.dir;
}

async function cli(args: string[], cwd: string) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await run(args, { stdout: { write: (s: string) => out.push(s) }, stderr: { write: (s: string) => err.push(s) }, cwd, env: {}, isTTY: false });
  return { code, stdout: out.join(''), stderr: err.join('') };
}

describe('backtest flags', () => {
  it.each([
    [['--holdout', '0'], '--holdout', 'greater than 0 and at most 0.9'],
    [['--holdout', '0.95'], '--holdout', 'at most 0.9'],
    [['--holdout', 'ten'], '--holdout', '"ten"'],
    [['--seed', '1.5'], '--seed', 'whole number'],
    [['--seed', 'x'], '--seed', 'whole number'],
    [['--runs', '0'], '--runs', 'from 1 to 50'],
    [['--runs', '51'], '--runs', 'from 1 to 50'],
    [['--format', 'markdown'], '--format', 'one of text, json'],
    [['--output', 'docs/out.md'], '--output', 'inside the content root'],
    [['--per-target', '3'], '--per-target', 'is not taken by "backtest"; its flags:'],
  ])('rejects %j with exit 2 and a line naming %s', async (flags, name, accepted) => {
    const cwd = project();
    const r = await cli(['backtest', 'docs', '--no-cache', ...flags], cwd);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.split('\n').filter(Boolean)).toHaveLength(1);
    expect(r.stderr).toContain(name);
    expect(r.stderr).toContain(accepted);
  });

  it('has defaults holdout 0.1, seed 42, one run, link words not kept', () => {
    expect(parseBacktestFlags({})).toEqual({ holdout: 0.1, seed: 42, runs: 1, keepLinkText: false });
    expect(parseBacktestFlags({ holdout: '0.9', seed: '-7', runs: '50', 'keep-link-text': true })).toEqual({ holdout: 0.9, seed: -7, runs: 50, keepLinkText: true });
  });

  it('is listed in the help with its flags', async () => {
    const r = await cli(['backtest', '--help'], project());
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Usage: linkweave backtest [root]');
    for (const f of ['--holdout SHARE', '--seed N', '--runs N', '--keep-link-text']) expect(r.stdout).toContain(f);
  });
});

describe('backtest outputs', () => {
  it('prints the table with the settings and one row per method (exit 0)', async () => {
    const cwd = project();
    const r = await cli(['backtest', 'docs', '--holdout', '0.5', '--seed', '3', '--runs', '2', '--no-cache'], cwd);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('seeds 3..4 (2 runs)');
    expect(r.stdout).toContain("linkweave's candidates for their target");
    // Plain labels, no configuration keys; a one-sentence verdict against the best baseline.
    expect(r.stdout).not.toMatch(/suggest\.targets|maxNewLinksPerPage|perTarget|minSimilarity/);
    expect(r.stdout.replace(/\n(?=\S)/g, " ")).toMatch(/Verdict: linkweave finds \d+\.\d% of the held-out links among its first 5 proposed sources; the best baseline, [^,]+, finds \d+\.\d%: linkweave is /);
    expect(r.stdout).toContain("the link model's probability, refitted on each run's remaining links");
    const rows = r.stdout.split('\n').filter((l) => /^ {2}(method|linkweave|TF-IDF only|title phrase|random related|random page) /.test(l));
    expect(rows.map((l) => l.trim().split(/\s{2,}/)[0])).toEqual(['method', 'linkweave', 'TF-IDF only', 'title phrase', 'random related', 'random page']);
    expect(rows[0]!.trim().split(/\s+/)).toEqual(['method', 'R@1', 'R@5', 'R@10', 'P@1', 'P@5', 'P@10', 'MRR', 'anchor', 'line']);
  });

  it('writes byte-identical JSON for the same seed, to a file named by --output', async () => {
    const cwd = project();
    const a = await cli(['backtest', 'docs', '--holdout', '0.5', '--format', 'json', '--no-cache'], cwd);
    const b = await cli(['backtest', 'docs', '--holdout', '0.5', '--output', 'bt.json', '--quiet', '--no-cache'], cwd);
    expect(a.code).toBe(0);
    expect(b.code).toBe(0);
    expect(b.stdout).toBe('');
    expect(fs.readFileSync(path.join(cwd, 'bt.json'), 'utf8')).toBe(a.stdout);
    const doc = JSON.parse(a.stdout);
    expect(doc.schema).toBe('linkweave/backtest@1');
    expect(doc.site.pages).toBe(6);
    expect(doc.runs[0].heldOutPairs).toBeGreaterThan(0);
    expect(doc.summary.map((s: { method: string }) => s.method)).toEqual(['linkweave', 'tfidf', 'title-phrase', 'random', 'random-page']);
  });

  it('says so when nothing can be held out', async () => {
    const t = tempDir('linkweave-backtest-cli-');
    cleanups.push(t.cleanup);
    writeTree(t.dir, { 'docs/index.md': '# Home\n\n[A](a.md)\n', 'docs/a.md': '# A\n\n[Home](index.md)\n' });
    const r = await cli(['backtest', 'docs', '--no-cache'], t.dir);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Nothing was held out');
  });
});
