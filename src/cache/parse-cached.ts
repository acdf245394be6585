/** The parse stage with the cache in front: lookups, then the misses parsed, then the cache saved. */
import type { ResolvedOptions } from '../config/options.js';
import type { PageFacts, SourceFile } from '../types.js';
import { codeVersion } from './code.js';
import { parseFingerprint } from './fingerprint.js';
import { isCacheable } from './format.js';
import { openCache } from './store.js';
import type { CacheSettings, CacheStats } from './types.js';

/**
 * Facts of every file, in the order of `files`: taken from the cache when an entry has the same
 * path, content hash, tool version and code (`codeVersion`) and parse fingerprint
 * (`parseFingerprint`), parsed otherwise
 * (through `settings.parseMisses`), and stored back. The result equals parsing every file.
 * Cache problems never fail the run: a damaged or foreign cache file is ignored (and rewritten),
 * a folder that cannot be written gives `stats.warning`.
 */
export async function parseWithCache(
  files: readonly SourceFile[],
  options: ResolvedOptions,
  settings: CacheSettings,
): Promise<{ facts: PageFacts[]; stats: CacheStats }> {
  const total = files.length;
  const report = settings.onProgress;
  if (settings.dir === null) {
    let done = 0;
    const facts = await settings.parseMisses(files, (n) => report?.((done += n), total));
    const stats: CacheStats = {
      enabled: false, dir: null, files: total, hits: 0, parsed: total, uncacheable: 0, rejected: 0, ignored: [], written: 0, warning: null,
    };
    return { facts, stats };
  }

  const session = openCache(settings.dir, { version: codeVersion(settings.version), fingerprint: parseFingerprint(options) });
  const facts: PageFacts[] = new Array(total);
  const missIndex: number[] = [];
  let rejected = 0;
  let uncacheable = 0;
  for (let i = 0; i < total; i++) {
    const file = files[i];
    if (!isCacheable(file)) {
      uncacheable++;
      missIndex.push(i);
      continue;
    }
    const found = session.lookup(file);
    if ('facts' in found) facts[i] = found.facts;
    else {
      if (found.miss === 'rejected') rejected++;
      missIndex.push(i);
    }
  }
  const hits = total - missIndex.length;
  let done = hits;
  if (hits > 0 || total === 0) report?.(done, total);

  const misses = missIndex.map((i) => files[i]);
  const parsed = await settings.parseMisses(misses, (n) => report?.((done += n), total));
  for (let j = 0; j < missIndex.length; j++) {
    const i = missIndex[j];
    const file = files[i];
    const f = parsed[j];
    facts[i] = f;
    // Facts are keyed by their own file and hash; a mismatch (never expected) is simply not cached.
    if (isCacheable(file) && f.file === file.path && f.hash === file.hash && f.kind === file.kind) session.store(file, f);
  }

  const saved = session.save();
  const stats: CacheStats = {
    enabled: true,
    dir: settings.dir,
    files: total,
    hits,
    parsed: misses.length,
    uncacheable,
    rejected,
    ignored: session.ignored,
    written: saved.written,
    warning: saved.warning,
  };
  return { facts, stats };
}
