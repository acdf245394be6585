/** `collectSources`: find and read the site's source files (the only stage reading sources). */
import fs from 'node:fs';
import { isAbsolute, join, normalize, resolve } from 'node:path';
import { EngineError } from '../errors.js';
import type { ResolvedOptions } from '../config/options.js';
import type { SourceFile } from '../types.js';
import { isInside, listFiles, toRelative, WarningLog } from './list.js';
import { kindOfPath, SOURCE_EXTENSIONS, SOURCE_GLOB } from '../routes/index.js';
import { readSource } from './read.js';
import { compareText, describeIoError } from '../util/index.js';
import type { CollectResult } from './types.js';

/** Files read between two turns of the event loop (reads are synchronous; see read.ts). */
export const READ_BATCH = 64;

/**
 * Find the source files under `options.root` (include/exclude globs; node_modules, dot-folders
 * and dot-files always left out), read and decode them, and list the other files as assets.
 * Symlinks are followed only inside the root; loops are not re-entered.
 * @param extraExclude more globs or paths relative to the root to leave out (e.g. the
 *   navigation file or the report); absolute paths inside the root are made relative
 * @throws EngineError `E_NO_ROOT` when the root is not a readable folder, `E_CONFIG_INVALID`
 *   when a glob climbs out of the root
 */
export async function collectSources(options: ResolvedOptions, extraExclude: readonly string[] = []): Promise<CollectResult> {
  const realRoot = await realRootOf(options.root);
  checkPatterns('include', options.include);
  checkPatterns('exclude', options.exclude);
  const extra = extraExclude
    .map((p) => relativeGlob([realRoot, resolve(options.root)], p))
    .filter((p): p is string => p !== null);
  const ignore = [...options.exclude, ...extra];

  const warnings = new WarningLog();
  // With the default `include` (every source extension), the sources are the listed files that
  // end in one (the glob's match, case and all), so the tree is walked once instead of twice.
  const defaultInclude = options.include.length === 1 && options.include[0] === SOURCE_GLOB;
  const [matched, all] = defaultInclude
    ? await listFiles(realRoot, ['**/*'], ignore, warnings).then((files) => [files.filter((f) => SOURCE_EXTENSIONS.some((ext) => f.endsWith(ext))), files])
    : await Promise.all([listFiles(realRoot, options.include, ignore, warnings), listFiles(realRoot, ['**/*'], ignore, warnings)]);
  const sources: { rel: string; kind: NonNullable<ReturnType<typeof kindOfPath>> }[] = [];
  const sourceSet = new Set<string>();
  for (const rel of matched) {
    const kind = kindOfPath(rel);
    // A file matched by `include` without a source extension is an asset, not a page.
    if (kind === null) continue;
    sources.push({ rel, kind });
    sourceSet.add(rel);
  }
  const assets = all.filter((rel) => !sourceSet.has(rel));

  const ctx = { realRoot, maxFileBytes: options.maxFileBytes, realFolders: new Map<string, string>(), scratch: { buffer: Buffer.allocUnsafe(1 << 16) } };
  const files: SourceFile[] = [];
  for (let i = 0; i < sources.length; i++) {
    const { rel, kind } = sources[i];
    const outcome = readSource(join(realRoot, rel), rel, kind, ctx);
    if ('file' in outcome) files.push(outcome.file);
    else warnings.add(outcome.warning);
    // Let signals, timers and progress displays run.
    if (i % READ_BATCH === READ_BATCH - 1) await new Promise<void>((r) => setImmediate(r));
  }

  return {
    files: files.sort((a, b) => compareText(a.path, b.path)),
    assets: assets.sort(compareText),
    warnings: warnings.sorted(),
  };
}

/** Real path of the content root. @throws EngineError `E_NO_ROOT` */
export async function realRootOf(root: string): Promise<string> {
  let real: string;
  try {
    real = await fs.promises.realpath(root);
  } catch (error) {
    throw new EngineError('E_NO_ROOT', `content root "${root}" cannot be opened: ${describeIoError(error)}`);
  }
  const stat = await fs.promises.stat(real);
  if (!stat.isDirectory()) throw new EngineError('E_NO_ROOT', `content root "${root}" is not a folder`);
  return real;
}

/** Globs are relative to the root and may not climb out of it. */
function checkPatterns(key: 'include' | 'exclude', patterns: readonly string[]): void {
  for (const [i, p] of patterns.entries()) {
    const unslashed = p.startsWith('!') ? p.slice(1) : p;
    if (isAbsolute(unslashed) || unslashed.split('/').includes('..')) {
      throw new EngineError(
        'E_CONFIG_INVALID',
        `key "${key}.${i}": glob "${p}" leaves the content root; globs are relative to the root and may not start with "/" or contain ".."`,
      );
    }
  }
}

/** An extra exclusion as a glob relative to the root, or null when it lies outside the root. */
function relativeGlob(roots: readonly string[], p: string): string | null {
  if (!isAbsolute(p)) {
    const rel = normalize(p).split('\\').join('/');
    return rel === '..' || rel.startsWith('../') ? null : rel.replace(/^\.\//, '');
  }
  const abs = normalize(p);
  const root = roots.find((r) => isInside(r, abs));
  return root === undefined ? null : toRelative(root, abs);
}
