/**
 * The whole-report cache: when nothing that a report depends on has changed since the last run
 * (every source's path and content hash, the assets, the navigation, redirects and traffic
 * files, the resolved options, the command, the baseline and the tool version), the last report
 * is returned as it was, without parsing, ranking or suggesting again. It lives beside the
 * page-facts shards, one file per command, written atomically; a file that does not parse, or
 * whose key differs, is ignored (and replaced by the next run), never trusted.
 */
import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import type { Report } from '../types.js';

const RESULT_SCHEMA = 'linkweave/report-cache@1';

/** Everything a report depends on, as plain data (hashed, never stored). */
export interface ResultInputs {
  readonly version: string;
  readonly command: string;
  readonly options: unknown;
  readonly sources: readonly { readonly path: string; readonly hash: string; readonly problems: unknown }[];
  readonly rest: unknown;
}

/** A sha256 over the inputs of a report. */
export function resultKey(inputs: ResultInputs): string {
  const hash = createHash('sha256');
  hash.update(`${inputs.version}\n${inputs.command}\n${JSON.stringify(inputs.options)}\n`);
  for (const s of inputs.sources) hash.update(`${s.path}\0${s.hash}\0${JSON.stringify(s.problems)}\n`);
  hash.update(JSON.stringify(inputs.rest));
  return hash.digest('hex');
}

function resultFile(dir: string, command: string): string {
  return join(dir, `report-${command}.json`);
}

/** The cached report for `key`, or null (absent, unreadable, foreign or stale). */
export function readResult(dir: string, command: string, key: string): Report | null {
  try {
    const stored = JSON.parse(fs.readFileSync(resultFile(dir, command), 'utf8')) as unknown;
    if (typeof stored !== 'object' || stored === null) return null;
    const { schema, key: storedKey, report } = stored as { schema?: unknown; key?: unknown; report?: unknown };
    if (schema !== RESULT_SCHEMA || storedKey !== key) return null;
    if (typeof report !== 'object' || report === null || (report as { schema?: unknown }).schema !== 'linkweave/report@1') return null;
    return report as Report;
  } catch {
    return null;
  }
}

/** Store `report` under `key` (temp file + rename). Never throws: a cache that cannot be written is skipped. */
export function writeResult(dir: string, command: string, key: string, report: Report): void {
  const target = resultFile(dir, command);
  const temp = join(dir, `.report-${command}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    fs.mkdirSync(dir, { recursive: true });
    fs.writeFileSync(temp, JSON.stringify({ schema: RESULT_SCHEMA, key, report }));
    fs.renameSync(temp, target);
  } catch {
    try {
      fs.rmSync(temp, { force: true });
    } catch {
      // The folder itself is unusable; there is nothing to clean.
    }
  }
}
