/** Helpers for the parse tests: a SourceFile from a string, and resolved options. */
import { createHash } from 'node:crypto';
import { resolveOptions } from '../../src/config/options.js';
import type { Config, ResolvedOptions } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import type { FileKind, PageFacts, SourceFile } from '../../src/types.js';

/** Options as a user would configure them (root is never read by parse). */
export function options(config: Config = {}): ResolvedOptions {
  return resolveOptions(config, '/site');
}

/** A source file as `collect` would hand it over. */
export function sourceFile(path: string, text: string, kind?: FileKind): SourceFile {
  return {
    path,
    kind: kind ?? (/\.html?$/i.test(path) ? 'html' : 'markdown'),
    bytes: Buffer.byteLength(text),
    hash: createHash('sha256').update(text).digest('hex'),
    text,
    problems: [],
  };
}

/** Parse a Markdown text as `page.md`. */
export function md(text: string, config: Config = {}, path = 'page.md'): PageFacts {
  return parseSource(sourceFile(path, text), options(config));
}

/** Parse an HTML text as `page.html`. */
export function html(text: string, config: Config = {}, path = 'page.html'): PageFacts {
  return parseSource(sourceFile(path, text), options(config));
}

/** The source text at a 1-based line/column (line endings: \n, \r\n, \r). */
export function at(text: string, line: number, column: number): string {
  const lines = text.split(/\r\n|\r|\n/);
  return lines[line - 1]!.slice(column - 1);
}
