/**
 * The whole-report cache: when nothing that a report depends on has changed since the last run
 * (every source's path and content hash, the assets, the navigation, redirects and traffic
 * files, the resolved options, the command, the baseline, the tool version and the code itself,
 * see `codeHash`), the last report
 * is returned as it was, without parsing, ranking or suggesting again. It lives beside the
 * page-facts shards, one file per command, written atomically; a file whose head does not parse,
 * whose key differs or whose sizes do not add up is ignored (and replaced by the next run), never
 * trusted.
 */
import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import { EngineError } from '../errors.js';
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
 * `ROWS_PER_LINE`. The last line, `{"bytes":[...]}`, gives the bytes of each field's lines, so
 * that a field is read without reading the ones before it. A file whose sizes do not add up
 * (cut short) is ignored.
 */
const ROWS_PER_LINE = 5000;

/**
 * A field whose lines take more bytes than this is read and decoded when it is first used, not
 * when the report is read: a run whose report comes from the cache and is written out as a copy
 * of the last run's output (`copyCachedOutput`) never reads the pages, links or suggestions at
 * all. Reading and decoding them was most of such a run.
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

/** The open cache file behind the fields of one report that are not read yet. */
interface Pending {
  fd: number | null;
  fields: number;
  /** The cache file, named when a field cannot be read. */
  readonly file: string;
}

/** Closes the file of a report dropped with fields never read. */
const unread = new FinalizationRegistry<Pending>((pending) => closePending(pending));

function closePending(pending: Pending): void {
  if (pending.fd === null) return;
  try {
    fs.closeSync(pending.fd);
  } catch {
    // Already closed: nothing to do.
  }
  pending.fd = null;
}

/**
 * The cached report for `key`, or null (absent, unreadable, foreign, stale or cut short).
 *
 * Its large fields (see `DECODE_ON_READ_BYTES`) are read when first used: they are enumerable
 * properties in the report's field order all the same, so `JSON.stringify`, spreading and
 * comparing see the report as it was written. Until then the file stays open (a later run that
 * replaces it renames a new file over it, so this report's bytes stay readable); it is closed
 * once every such field was read, or when the report is dropped.
 */
export function readResult(dir: string, command: string, key: string): Report | null {
  let fd: number | null = null;
  try {
    const file = resultFile(dir, command);
    fd = fs.openSync(file, 'r');
    const size = fs.fstatSync(fd).size;
    // The head is read and checked before the rest: after a change (the usual case in a pull
    // request) the key differs, and reading a large report for nothing costs time.
    const first = readBytes(fd, 0, Math.min(HEAD_BYTES, size));
    const headEnd = first.indexOf(10);
    if (headEnd === -1) return null;
    const head = JSON.parse(first.toString('utf8', 0, headEnd)) as unknown;
    if (!isHead(head) || head.key !== key) return null;
    const tailStart = Math.max(headEnd + 1, size - TAIL_BYTES);
    const tail = readBytes(fd, tailStart, size - tailStart);
    if (tail.length < 2 || tail[tail.length - 1] !== 10) return null;
    const trailerStart = tail.lastIndexOf(10, tail.length - 2) + 1;
    if (trailerStart === 0 && tailStart !== headEnd + 1) return null;
    const trailer = JSON.parse(tail.toString('utf8', trailerStart, tail.length - 1)) as { bytes?: unknown };
    const bytes = trailer.bytes;
    if (!Array.isArray(bytes) || bytes.length !== head.fields.length || !bytes.every((b) => Number.isInteger(b) && b >= 2)) return null;
    const sizes = bytes as number[];
    if (headEnd + 1 + sizes.reduce((a, b) => a + b, 0) + (tail.length - trailerStart) !== size) return null;

    const report: Record<string, unknown> = {};
    const pending: Pending = { fd, fields: 0, file };
    let offset = headEnd + 1;
    head.fields.forEach(([name, lines], i) => {
      const span = { offset, length: sizes[i], lines };
      offset += sizes[i];
      if (span.length <= DECODE_ON_READ_BYTES) report[name] = decodeField(readBytes(fd!, span.offset, span.length), span.lines);
      else {
        pending.fields++;
        decodeOnRead(report, name, span, pending);
      }
    });
    if (report.schema !== 'linkweave/report@1') return null;
    if (pending.fields === 0) return report as unknown as Report;
    unread.register(report, pending, pending);
    fd = null;
    return report as unknown as Report;
  } catch {
    return null;
  } finally {
    if (fd !== null) fs.closeSync(fd);
  }
}

/** `length` bytes of the file at `offset` (fewer only at its end). */
function readBytes(fd: number, offset: number, length: number): Buffer {
  const buffer = Buffer.allocUnsafe(length);
  let done = 0;
  while (done < length) {
    const n = fs.readSync(fd, buffer, done, length - done, offset + done);
    if (n === 0) break;
    done += n;
  }
  return buffer.subarray(0, done);
}

/**
 * The value of one field from its `lines` lines (each ending in a newline): one value, or the
 * items of its lines in order.
 * @throws when the bytes are not those lines
 */
function decodeField(bytes: Buffer, lines: number): unknown {
  const values: unknown[] = [];
  let start = 0;
  for (let k = 0; k < lines; k++) {
    const end = bytes.indexOf(10, start);
    if (end === -1) throw new Error('report cache: a field has fewer lines than its head says');
    values.push(JSON.parse(bytes.toString('utf8', start, end)));
    start = end + 1;
  }
  if (start !== bytes.length) throw new Error('report cache: a field has more bytes than its lines');
  if (lines === 1) return values[0];
  const items: unknown[] = [];
  for (const line of values) for (const item of line as unknown[]) items.push(item);
  return items;
}

/**
 * Make `name` a property of `target` that reads and decodes its lines from the open cache file
 * when first used (or takes the value it is first given).
 */
function decodeOnRead(target: Record<string, unknown>, name: string, span: { offset: number; length: number; lines: number }, pending: Pending): void {
  const settle = (value: unknown): void => {
    Object.defineProperty(target, name, { value, enumerable: true, configurable: true, writable: true });
    pending.fields--;
    if (pending.fields === 0) {
      closePending(pending);
      unread.unregister(pending);
    }
  };
  Object.defineProperty(target, name, {
    enumerable: true,
    configurable: true,
    get() {
      // The head, the sizes and the small fields were checked when the report was taken from the
      // cache; a large field that cannot be decoded now means the file was changed by hand or
      // damaged on disk. Say which file, and how to get past it.
      const fail = (why: string): never => {
        throw new EngineError('E_IO', `report cache ${pending.file}: the report's "${name}" cannot be read (${why}); delete the cache folder and run again`);
      };
      if (pending.fd === null) return fail('its file was closed before it was read');
      let value: unknown;
      try {
        value = decodeField(readBytes(pending.fd, span.offset, span.length), span.lines);
      } catch (error) {
        return fail(error instanceof Error ? error.message : String(error));
      }
      settle(value);
      return value;
    },
    set: settle,
  });
}

/** Bytes read for the head line (the head of a report is about 300). */
const HEAD_BYTES = 8192;
/** Bytes read from the end for the last line (about 100). */
const TAIL_BYTES = 8192;

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
    const out = fd;
    const write = (line: string): number => fs.writeSync(out, `${line}\n`);
    write(JSON.stringify(head));
    const bytes: number[] = [];
    for (const [, value] of fields) {
      let written = 0;
      if (linesOf(value) === 1) written += write(JSON.stringify(value));
      else {
        const items = value as unknown[];
        for (let i = 0; i < items.length; i += ROWS_PER_LINE) written += write(JSON.stringify(items.slice(i, i + ROWS_PER_LINE)));
      }
      bytes.push(written);
    }
    write(JSON.stringify({ bytes }));
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
