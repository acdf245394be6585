/** Test helpers of the cache tests: temp folders, file trees, source files and hand-built facts. */
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { PageFacts, SourceFile } from '../../src/types.js';

/** A new empty temp folder (real path) and its cleanup. */
export function tempDir(prefix = 'linkweave-cache-'): { dir: string; cleanup: () => void } {
  const dir = fs.realpathSync(fs.mkdtempSync(path.join(os.tmpdir(), prefix)));
  return { dir, cleanup: () => fs.rmSync(dir, { recursive: true, force: true }) };
}

/** Write `tree` (posix path -> text) under `dir`. */
export function writeTree(dir: string, tree: Record<string, string>): void {
  for (const [rel, text] of Object.entries(tree)) {
    const file = path.join(dir, ...rel.split('/'));
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, text);
  }
}

/** A source file as collect would give it (UTF-8 text, no problems unless given). */
export function sourceFile(p: string, text: string, problems: SourceFile['problems'] = []): SourceFile {
  const bytes = Buffer.from(text, 'utf8');
  return {
    path: p,
    kind: /\.html?$/.test(p) ? 'html' : 'markdown',
    bytes: bytes.length,
    hash: createHash('sha256').update(bytes).digest('hex'),
    text,
    problems,
  };
}

/**
 * Facts of a page built by hand (not by the parser): one heading, one link, the spans of every
 * word run after the heading line, so the cache's storage can be tested on its own.
 */
export function handFacts(file: SourceFile): PageFacts {
  const text = file.text;
  const spans = [...text.matchAll(/[A-Za-z][A-Za-z ]*[A-Za-z]/g)].map((m) => {
    const before = text.slice(0, m.index);
    const line = before.split('\n').length;
    return { text: m[0], offset: m.index, line, column: m.index - before.lastIndexOf('\n') };
  });
  return {
    file: file.path,
    kind: file.kind,
    hash: file.hash,
    route: `/${file.path.replace(/\.(md|html)$/, '')}/`,
    title: 'A page',
    meta: { draft: false, noindex: false, aliases: ['/old/'], exclude: false },
    headings: [{ depth: 1, text: 'A page', slug: 'a-page', line: 1, column: 1 }],
    ids: ['a-page'],
    links: [{ href: '../other/', text: 'other', line: 2, column: 3, context: 'content', nofollow: false, origin: 'markdown' }],
    text: { title: 'A page', headings: 'A page', body: text },
    spans,
    protected: [],
    problems: file.problems,
  };
}
