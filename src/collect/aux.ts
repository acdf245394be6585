/** Reading the auxiliary files a configuration names: navigation, redirects, traffic. */
import fs from 'node:fs';
import { resolve } from 'node:path';
import { EngineError } from '../errors.js';
import type { ResolvedOptions } from '../config/options.js';
import { realRootOf } from './collect.js';
import { isInside, toRelative } from './list.js';
import { describeIoError } from '../util/index.js';

/** The configuration keys that name an auxiliary file. */
export type AuxKey = 'navigation' | 'redirects' | 'traffic';

const decoder = new TextDecoder('utf-8', { fatal: false, ignoreBOM: false });

/**
 * Read one auxiliary file. `relPath` is relative to the content root (or absolute); its real
 * path must lie inside the content root or inside the working folder (where the configuration
 * usually is), so a configuration cannot make linkweave read arbitrary files.
 * @returns `file`: the path relative to the content root with `/` separators (it starts with
 *   `../` when the file is in the working folder outside the root); `text`: UTF-8, BOM removed
 * @throws EngineError `E_IO` naming the key and the path when the file is missing, unreadable,
 *   larger than `maxFileBytes` or outside both folders
 */
export async function readAuxFile(
  options: ResolvedOptions,
  key: AuxKey,
  relPath: string,
): Promise<{ file: string; text: string }> {
  const fail = (reason: string): never => {
    throw new EngineError('E_IO', `${key}: cannot read "${relPath}": ${reason}`);
  };
  const realRoot = await realRootOf(options.root);
  let real = '';
  try {
    real = await fs.promises.realpath(resolve(realRoot, relPath));
  } catch (error) {
    fail(describeIoError(error));
  }
  const realCwd = await fs.promises.realpath(process.cwd()).catch(() => null);
  if (!isInside(realRoot, real) && (realCwd === null || !isInside(realCwd, real))) {
    fail('it lies outside the content root and the working folder');
  }
  let bytes: Buffer | undefined;
  try {
    const stat = await fs.promises.stat(real);
    if (!stat.isFile()) fail('not a regular file');
    if (stat.size > options.maxFileBytes) fail(`${stat.size} bytes, over maxFileBytes (${options.maxFileBytes})`);
    bytes = await fs.promises.readFile(real);
  } catch (error) {
    if (error instanceof EngineError) throw error;
    fail(describeIoError(error));
  }
  return { file: toRelative(realRoot, real), text: decoder.decode(bytes) };
}
