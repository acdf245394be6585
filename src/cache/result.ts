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

const RESULT_SCHEMA = 'linkweave/report-cache@3';

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
 * most 2^29 - 24 characters; a 100,000-page report is several times that). The first line is
 * the head, `{"schema","key","fields"}`, where `fields` lists each report field in order with
 * the number of lines it takes: `[name, lines]`. Then come those lines, field after field: the
 * field's value, or, for an array longer than `ROWS_PER_LINE`, its items in lines of
 * `ROWS_PER_LINE`. A file whose line count is not what its head says (cut short) is ignored.
 */
const ROWS_PER_LINE = 5000;

/**
 * A field whose lines take more bytes than this is decoded when it is first read, not when the
 * file is read: a run whose report comes from the cache and is written out as the bytes of the
 * last run (`readCachedOutput`) never reads the pages, links or suggestions at all, and their
 * decoding was most of such a run.
 */
const DECODE_ON_READ_BYTES = 64 * 1024;

interface ResultHead {
  readonly schema: string;
  readonly key: string;
  readonly fields: readonly (readonly [string, number])[];
}

function isHead(value: unknown): value is ResultHead {
  if (typeof value !== 'object' || value === null) return false;
  const head = value as Partial<ResultHead>;
  return (
    head.schema === RESULT_SCHEMA &&
    typeof head.key === 'string' &&
    Array.isArray(head.fields) &&
    head.fields.every((f) => Array.isArray(f) && f.length === 2 && typeof f[0] === 'string' && Number.isInteger(f[1]) && f[1] >= 1)
  );
}

/**
 * The cached report for `key`, or null (absent, unreadable, foreign, stale or cut short). Its
 * large fields are decoded on first read (see `DECODE_ON_READ_BYTES`); they are enumerable
 * properties in the report's field order all the same, so `JSON.stringify`, spreading and
 * comparing see the report as it was written.
 */
export function readResult(dir: string, command: string, key: string): Report | null {
  try {
    // The head line is read and checked before the rest: after a change (the usual case in a
    // pull request) the key differs, and reading a large report for nothing costs time.
    const file = resultFile(dir, command);
    const head = JSON.parse(readHead(file)) as unknown;
    if (!isHead(head) || head.key !== key) return null;
    const bytes = fs.readFileSync(file);
    const ends = lineEnds(bytes);
    const expected = 1 + head.fields.reduce((sum, [, lines]) => sum + lines, 0);
    if (ends.length !== expected) return null;
    const report: Record<string, unknown> = {};
    let line = 1;
    for (const [name, lines] of head.fields) {
      const spans: [number, number][] = [];
      for (let k = 0; k < lines; k++, line++) spans.push([ends[line - 1] + 1, ends[line]]);
      const size = spans[spans.length - 1][1] - spans[0][0];
      if (size <= DECODE_ON_READ_BYTES) report[name] = decodeField(bytes, spans);
      else decodeOnRead(report, name, bytes, spans);
    }
    if (report.schema !== 'linkweave/report@1') return null;
    return report as unknown as Report;
  } catch {
    return null;
  }
}

/** Offsets of the newlines of `bytes`; a file not ending in one is cut short (none returned). */
function lineEnds(bytes: Buffer): number[] {
  const ends: number[] = [];
  if (bytes.length === 0 || bytes[bytes.length - 1] !== 10) return ends;
  for (let at = bytes.indexOf(10); at !== -1; at = bytes.indexOf(10, at + 1)) ends.push(at);
  return ends;
}

/** The value of one field from its lines: one value, or the items of its lines in order. */
function decodeField(bytes: Buffer, spans: readonly (readonly [number, number])[]): unknown {
  if (spans.length === 1) return JSON.parse(bytes.toString('utf8', spans[0][0], spans[0][1]));
  const items: unknown[] = [];
  for (const [start, end] of spans) {
    for (const item of JSON.parse(bytes.toString('utf8', start, end)) as unknown[]) items.push(item);
  }
  return items;
}

/** Make `name` a property of `target` that decodes its lines when first read (or is replaced when first set). */
function decodeOnRead(target: Record<string, unknown>, name: string, bytes: Buffer, spans: readonly (readonly [number, number])[]): void {
  const settle = (value: unknown): void => {
    Object.defineProperty(target, name, { value, enumerable: true, configurable: true, writable: true });
  };
  Object.defineProperty(target, name, {
    enumerable: true,
    configurable: true,
    get() {
      const value = decodeField(bytes, spans);
      settle(value);
      return value;
    },
    set: settle,
  });
}

/** The first line of `file` (the head: its schema, key and field list), read alone. */
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

/** Bytes read for the head line (the head of a report is about 600). */
const HEAD_BYTES = 8192;

/** Store `report` under `key` (temp file + rename). Never throws: a cache that cannot be written is skipped. */
export function writeResult(dir: string, command: string, key: string, report: Report): void {
  const target = resultFile(dir, command);
  const temp = join(dir, `.report-${command}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  let fd: number | null = null;
  try {
    const fields = Object.entries(report).filter(([, value]) => value !== undefined);
    const linesOf = (value: unknown): number => (Array.isArray(value) && value.length > ROWS_PER_LINE ? Math.ceil(value.length / ROWS_PER_LINE) : 1);
    const head: ResultHead = { schema: RESULT_SCHEMA, key, fields: fields.map(([name, value]) => [name, linesOf(value)] as const) };
    fs.mkdirSync(dir, { recursive: true });
    fd = fs.openSync(temp, 'w');
    fs.writeSync(fd, `${JSON.stringify(head)}\n`);
    for (const [, value] of fields) {
      if (linesOf(value) === 1) {
        fs.writeSync(fd, `${JSON.stringify(value)}\n`);
        continue;
      }
      const items = value as unknown[];
      for (let i = 0; i < items.length; i += ROWS_PER_LINE) fs.writeSync(fd, `${JSON.stringify(items.slice(i, i + ROWS_PER_LINE))}\n`);
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
