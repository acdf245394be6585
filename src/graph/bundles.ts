/**
 * Hugo's leaf bundles: a folder holding an `index.md` (not `_index.md`) is one page, and every
 * other content file in it or below it is a resource of that page, no page of its own (Hugo
 * docs, "Page bundles"). Pure.
 */
import type { PageFacts } from '../types.js';

const LEAF_INDEX = /(^|\/)index\.(?:md|markdown|mdx|html?)$/i;

/**
 * The files that are resources of a leaf bundle.
 * @param facts every parsed file (drafts too: a headless bundle's resources are no pages either)
 */
export function bundleResources(facts: readonly PageFacts[]): Set<string> {
  const bundles = new Set<string>();
  for (const f of facts) {
    const m = LEAF_INDEX.exec(f.file);
    if (m !== null && m.index > 0) bundles.add(f.file.slice(0, m.index + 1));
  }
  const out = new Set<string>();
  if (bundles.size === 0) return out;
  for (const f of facts) {
    const own = f.file.slice(0, f.file.lastIndexOf('/') + 1);
    // The bundle's own index stays a page; a bundle folder's nearest ancestor bundle owns the rest.
    let folder = LEAF_INDEX.test(f.file) ? own.slice(0, own.slice(0, -1).lastIndexOf('/') + 1) : own;
    while (folder !== '') {
      if (bundles.has(folder)) {
        out.add(f.file);
        break;
      }
      folder = folder.slice(0, folder.slice(0, -1).lastIndexOf('/') + 1);
    }
  }
  return out;
}
