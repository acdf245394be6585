/**
 * Include directives resolved among the sources: a file another page pulls in is part of that
 * page (its ids are the page's ids) and no page of its own; an include whose file is not among
 * the sources leaves the page's ids unknown (its fragments are never broken). Pure.
 */
import type { PageFacts } from '../types.js';

/** What the includes of a site come to. */
export interface IncludeResolution {
  /** Files pulled in by another page: no pages of their own. */
  readonly includedFiles: ReadonlySet<string>;
  /** By facts index: the facts of the source files that file pulls in (transitively). */
  readonly pulledIn: ReadonlyMap<number, readonly PageFacts[]>;
  /** Facts indexes of files with an include outside the sources. */
  readonly unknown: ReadonlySet<number>;
  /** Includes outside the sources, once per written path, sorted: `file:line:column` of the first and the path. */
  readonly outside: readonly { readonly file: string; readonly line: number; readonly column: number; readonly written: string }[];
}

/**
 * Resolve every page's includes.
 * @param facts every parsed file
 * @param assets the other files under the content root
 * @param folders `generated.includeFolders`: folders (relative to the content root) tried after
 *   a directive's own paths
 */
export function resolveIncludes(facts: readonly PageFacts[], assets: readonly string[], folders: readonly string[] = []): IncludeResolution {
  const byFile = new Map<string, number>();
  facts.forEach((f, i) => byFile.set(f.file, i));
  const assetSet = new Set(assets);
  const direct = new Map<number, number[]>();
  const unknown = new Set<number>();
  const includedFiles = new Set<string>();
  const outside = new Map<string, { file: string; line: number; column: number; written: string }>();
  facts.forEach((f, i) => {
    for (const raw of f.includes ?? []) {
      const inc = folders.length === 0 ? raw : { ...raw, paths: [...raw.paths, ...folders.map((d) => underFolder(d, raw.written))] };
      const source = inc.paths.find((p) => byFile.has(p));
      if (source !== undefined) {
        if (source === f.file) continue;
        includedFiles.add(source);
        const list = direct.get(i) ?? [];
        list.push(byFile.get(source)!);
        direct.set(i, list);
      } else if (!inc.paths.some((p) => assetSet.has(p))) {
        unknown.add(i);
        if (!outside.has(inc.written)) outside.set(inc.written, { file: f.file, line: inc.line, column: inc.column, written: inc.written });
      }
    }
  });
  const pulledIn = new Map<number, PageFacts[]>();
  for (const start of direct.keys()) {
    const seen = new Set<number>([start]);
    const queue = [...direct.get(start)!];
    const out: PageFacts[] = [];
    while (queue.length > 0) {
      const next = queue.shift()!;
      if (seen.has(next)) continue;
      seen.add(next);
      out.push(facts[next]);
      if (unknown.has(next)) unknown.add(start);
      queue.push(...(direct.get(next) ?? []));
    }
    pulledIn.set(start, out);
  }
  const list = [...outside.values()].sort((a, b) => (a.written < b.written ? -1 : a.written > b.written ? 1 : 0));
  return { includedFiles, pulledIn, unknown, outside: list };
}

/** `written` read from `folder` (relative to the content root), dot segments removed; a leading `../` kept. */
function underFolder(folder: string, written: string): string {
  const out: string[] = [];
  let up = 0;
  for (const seg of `${folder}/${written.replace(/^\/+/, '')}`.split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') {
      if (out.length > 0) out.pop();
      else up++;
    } else out.push(seg);
  }
  return '../'.repeat(up) + out.join('/');
}
