/**
 * Issue 7, "writes", the case the other tests leave open: `apply` takes its suggestions from a
 * report, which is input and may name any file. Paths with `..`, absolute paths and non-sources
 * are refused by test/apply/command.test.ts; here the path is a plain source path inside the
 * root that leads outside through a symlink (a file symlink and a folder symlink). The outside
 * file must stay byte for byte, the rest of the suggestions are applied, and no temp file is
 * left. (Atomic writes: test/util/write-file.test.ts; refusing --output over a source and SIGINT
 * mid-run leaving the previous report whole with no temp file: test/cli/cli.test.ts.)
 */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/run.js';
import { TEMP_PREFIX } from '../../src/report/index.js';
import { cleanupAll, project } from './helpers.js';

afterEach(cleanupAll);

const CANARY = 'LW-CANARY-write-81c4e0';
const TEXT = '# Notes\n\nThe wiring matters here.\n';

function suggestion(id: string, file: string, text: string, anchor: string) {
  const offset = text.indexOf(anchor);
  const lines = text.slice(0, offset).split('\n');
  return {
    id, source: `/${file.replace(/\.md$/, '/')}`, target: '/wiring/', file, line: lines.length, column: lines.at(-1)!.length + 1,
    offset, endOffset: offset + anchor.length, anchor, similarity: 0.3, score: 0.3, targetRankBefore: 0.2, targetRankAfter: 0.3,
    depthBefore: 2, depthAfter: 1, reason: '', sourceHash: createHash('sha256').update(text).digest('hex'),
  };
}

function tempFiles(dir: string): string[] {
  return fs.readdirSync(dir, { recursive: true }).map(String).filter((f) => path.basename(f).startsWith(TEMP_PREFIX));
}

describe('apply never writes outside the content root', () => {
  it('a report naming a symlink out of the root (file or folder): refused, the outside file untouched, the rest applied', async () => {
    const outsideText = `${TEXT}${CANARY}\n`;
    const { dir, root } = project({
      'outside/notes.md': outsideText,
      'docs/index.md': '# Home\n\n[Wiring](wiring.md) and [notes](notes.md).\n',
      'docs/wiring.md': '# Wiring\n\nBack [home](index.md).\n',
      'docs/notes.md': TEXT,
    });
    fs.symlinkSync(path.join(dir, 'outside', 'notes.md'), path.join(root, 'leak.md'));
    fs.symlinkSync('../outside', path.join(root, 'leakdir'));
    const files: Record<string, string> = { '/': 'index.md', '/wiring/': 'wiring.md', '/notes/': 'notes.md', '/leak/': 'leak.md', '/leakdir/notes/': 'leakdir/notes.md' };
    const pages = Object.entries(files).map(([route, file]) => ({ route, file, title: route, pagerank: 0.2, rank: 1, depth: 1, inlinks: 1, contentInlinks: 1, outlinks: 1, importance: 'normal' }));
    const report = {
      schema: 'linkweave/report@1', tool: { name: 'linkweave', version: '0' }, root, pages, findings: [],
      suggestions: [
        suggestion('s-leak', 'leak.md', outsideText, 'wiring'),
        suggestion('s-dir', 'leakdir/notes.md', outsideText, 'wiring'),
        suggestion('s-ok', 'notes.md', TEXT, 'wiring'),
      ],
    };
    fs.writeFileSync(path.join(dir, 'r.json'), JSON.stringify(report));
    let stdout = '';
    let stderr = '';
    const code = await run(['apply', 'docs', '--from', 'r.json', '--all', '--no-cache'], {
      stdout: { write: (s: string) => (stdout += s) }, stderr: { write: (s: string) => (stderr += s) }, cwd: dir, env: {}, isTTY: false,
    });
    expect(code, stdout + stderr).toBe(1);
    expect(stdout.match(/resolves outside the content root; skipped/g)).toHaveLength(2);
    expect(fs.readFileSync(path.join(dir, 'outside', 'notes.md'), 'utf8')).toBe(outsideText);
    expect(fs.lstatSync(path.join(root, 'leak.md')).isSymbolicLink()).toBe(true);
    expect(fs.readFileSync(path.join(root, 'notes.md'), 'utf8')).toBe('# Notes\n\nThe [wiring](wiring.md) matters here.\n');
    expect(stdout).not.toContain(CANARY);
    expect(tempFiles(dir)).toEqual([]);
  });
});
