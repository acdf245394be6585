/**
 * Issue 7: files that vanish or become unreadable while the site is read give a finding naming
 * them, never a crash, and the rest of the site is analysed.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { collectInputs, finishAnalysis } from '../../src/pipeline/index.js';
import { readSource } from '../../src/collect/index.js';
import type { CollectWarning } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { SourceFile } from '../../src/types.js';
import { cleanupAll, expectHealthyRest, findingsOf, healthy, project, run } from './helpers.js';

afterEach(cleanupAll);

describe('files that cannot be read', () => {
  it('a symlink (inside the root) to a FIFO named like a page: an unreadable error, the run does not block', async () => {
    const { root } = project({ ...healthy('pipe.md'), 'docs/.pipe': 'placeholder' });
    fs.rmSync(path.join(root, '.pipe'));
    expect(spawnSync('mkfifo', [path.join(root, '.pipe')]).status).toBe(0);
    fs.symlinkSync('.pipe', path.join(root, 'pipe.md'));
    const report = await run(root);
    expect(findingsOf(report, 'pipe.md')).toEqual([
      {
        rule: 'source-problem',
        severity: 'error',
        file: 'pipe.md',
        line: 1,
        column: 1,
        route: '',
        message: '"pipe.md" is not a regular file; skipped',
        target: 'unreadable',
      },
    ]);
    // It is no page, so the link to it is broken.
    expect(findingsOf(report, 'index.md')).toMatchObject([{ rule: 'broken-link', target: 'pipe.md' }]);
    expectHealthyRest(report);
  });

  it('a file deleted and a file replaced by a folder after the listing: vanished and unreadable findings', async () => {
    // The gap between the listing and the reads cannot be hit on cue from outside, so this runs
    // the collector's two steps (list and read everything, then read each listed file again with
    // `readSource`, as collectSources does) with the change in between, then the later stages.
    const { root } = project({
      ...healthy('gone.md'),
      'docs/gone.md': '# Gone\n\n[home](index.md)\n',
      'docs/folder.md': '# Folder\n\n[home](index.md)\n',
    });
    const options = resolveOptions({ workers: 1, cache: { enabled: false } }, root);
    const listed = await collectInputs(options);
    expect(listed.sources.files.map((f) => f.path)).toEqual(['folder.md', 'gone.md', 'guide.md', 'index.md', 'reference.md']);

    fs.rmSync(path.join(root, 'gone.md'));
    fs.rmSync(path.join(root, 'folder.md'));
    fs.mkdirSync(path.join(root, 'folder.md'));

    const files: SourceFile[] = [];
    const warnings: CollectWarning[] = [];
    for (const f of listed.sources.files) {
      const outcome = readSource(path.join(root, f.path), f.path, f.kind, { realRoot: root, maxFileBytes: options.maxFileBytes });
      if ('file' in outcome) files.push(outcome.file);
      else warnings.push(outcome.warning);
    }
    const collected = { ...listed, sources: { ...listed.sources, files, warnings } };
    const facts = files.map((f) => parseSource(f, options));
    const report = await finishAnalysis({ options, command: 'check', facts, collected, hooks: {} });

    expect(report.findings.filter((f) => f.rule === 'source-problem')).toEqual([
      expect.objectContaining({ file: 'folder.md', severity: 'error', target: 'unreadable', message: '"folder.md" is not a regular file; skipped' }),
      expect.objectContaining({ file: 'gone.md', severity: 'warning', target: 'vanished', message: '"gone.md" disappeared while the site was being read; skipped' }),
    ]);
    expect(findingsOf(report, 'index.md')).toMatchObject([{ rule: 'broken-link', target: 'gone.md' }]);
    expect(report.stats.files).toBe(3);
    expectHealthyRest(report);
  });
});
