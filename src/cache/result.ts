/**
 * The whole-report cache: when nothing that a report depends on has changed since the last run
 * (every source's path and content hash, the assets, the navigation, redirects and traffic
 * files, the resolved options, the command, the baseline, the tool version and the code itself,
 * see `codeHash`), the last report
 * is returned as it was, without parsing, ranking or suggesting again. It lives beside the
 * page-facts shards, one file per command, written atomically; a file that does not parse, or
 * whose key differs, is ignored (and replaced by the next run), never trusted.
 */
import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import type { Report } from '../types.js';
import { codeVersion } from './code.js';

const RESULT_SCHEMA = 'linkweave/report-cache@2';

/** Everything a report depends on, as plain data (hashed, never stored). */
export interface ResultInputs {
  readonly version: string;
  readonly command: string;
  readonly options: unknown;
  readonly sources: readonly { readonly path: string; readonly hash: string; readonly problems: unknown }[];
  readonly rest: unknown;
}

/** A sha256 over the inputs of a report and the code that computes it (`codeHash`). */
export function resultKey(inputs: ResultInputs): string {
  const hash = createHash('sha256');
  hash.update(`${codeVersion(inputs.version)}\n${inputs.command}\n${JSON.stringify(inputs.options)}\n`);
  for (const s of inputs.sources) hash.update(`${s.path}\0${s.hash}\0${JSON.stringify(s.problems)}\n`);
  hash.update(JSON.stringify(inputs.rest));
  return hash.digest('hex');
}

function resultFile(dir: string, command: string): string {
  return join(dir, `report-${command}.json`);
}

/**
 * The file holds one JSON value per line, so that no line outgrows a string (V8 strings hold at
 * most 2^29 - 24 characters; a 100,000-page report is several times that): first
 * `{"schema","key"}`, then one line per report field, `[name, value]`, with long arrays split
 * into lines of `ROWS_PER_LINE` items, `[name, items, true]` for each line after the first.
 */
const ROWS_PER_LINE = 5000;

/** The cached report for `key`, or null (absent, unreadable, foreign or stale). */
export function readResult(dir: string, command: string, key: string): Report | null {
  try {
    // The head line is read and checked before the rest: after a change (the usual case in a
    // pull request) the key differs, and reading and decoding a large report for nothing cost
    // seconds at 10,000 pages.
    const file = resultFile(dir, command);
    const head = JSON.parse(readHead(file)) as { schema?: unknown; key?: unknown } | null;
    if (typeof head !== 'object' || head === null || head.schema !== RESULT_SCHEMA || head.key !== key) return null;
    const lines = splitLines(fs.readFileSync(file));
    const report: Record<string, unknown> = {};
    for (let i = 1; i < lines.length; i++) {
      const [name, value, more] = JSON.parse(lines[i]) as [string, unknown, boolean?];
      if (more === true) (report[name] as unknown[]).push(...(value as unknown[]));
      else report[name] = value;
    }
    if (report.schema !== 'linkweave/report@1') return null;
    return report as unknown as Report;
  } catch {
    return null;
  }
}

/** The first line of `file` (the head is short: its schema and key), read alone. */
function readHead(file: string): string {
  const fd = fs.openSync(file, 'r');
  try {
    const chunk = Buffer.alloc(HEAD_BYTES);
    const length = fs.readSync(fd, chunk, 0, HEAD_BYTES, 0);
    const end = chunk.subarray(0, length).indexOf(10);
    return chunk.toString('utf8', 0, end === -1 ? length : end);
  } finally {
    fs.closeSync(fd);
  }
}

/** Bytes read for the head line; `{"schema":"linkweave/report-cache@2","key":"<64 hex>"}` is 105. */
const HEAD_BYTES = 512;

function splitLines(bytes: Buffer): string[] {
  const lines: string[] = [];
  let start = 0;
  while (start < bytes.length) {
    let end = bytes.indexOf(10, start);
    if (end === -1) end = bytes.length;
    lines.push(bytes.toString('utf8', start, end));
    start = end + 1;
  }
  return lines;
}

/** Store `report` under `key` (temp file + rename). Never throws: a cache that cannot be written is skipped. */
export function writeResult(dir: string, command: string, key: string, report: Report): void {
  const target = resultFile(dir, command);
  const temp = join(dir, `.report-${command}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  let fd: number | null = null;
  try {
    fs.mkdirSync(dir, { recursive: true });
    fd = fs.openSync(temp, 'w');
    fs.writeSync(fd, `${JSON.stringify({ schema: RESULT_SCHEMA, key })}\n`);
    for (const [name, value] of Object.entries(report)) {
      if (value === undefined) continue;
      if (!Array.isArray(value) || value.length <= ROWS_PER_LINE) {
        fs.writeSync(fd, `${JSON.stringify([name, value])}\n`);
        continue;
      }
      for (let i = 0; i < value.length; i += ROWS_PER_LINE) {
        const line = i === 0 ? [name, value.slice(0, ROWS_PER_LINE)] : [name, value.slice(i, i + ROWS_PER_LINE), true];
        fs.writeSync(fd, `${JSON.stringify(line)}\n`);
      }
    }
    fs.closeSync(fd);
    fd = null;
    fs.renameSync(temp, target);
  } catch {
    try {
      if (fd !== null) fs.closeSync(fd);
      fs.rmSync(temp, { force: true });
    } catch {
      // The folder itself is unusable; there is nothing to clean.
    }
  }
}
