/**
 * Protected regions at apply time: which region an anchor overlaps, the plain words for it, and
 * whether an edited text kept every region of the original byte for byte. Pure.
 */
import type { ProtectedKind, ProtectedRegion } from '../types.js';

/** Plain words for an anchor inside a region of each kind. */
export const REGION_WORDS: Readonly<Record<ProtectedKind, string>> = {
  shortcode: 'inside a shortcode',
  'template-tag': 'inside template syntax ({{ }}, {% %} or {# #})',
  'template-block': 'inside a raw, comment or highlighted-code template block',
  'mdx-jsx': 'inside an MDX (JSX) tag',
  'mdx-expression': 'inside an MDX {...} expression',
  braces: 'inside curly braces (an expression or annotation a generator may read)',
  'html-tag': 'inside an HTML tag or its attributes',
  'html-comment': 'inside an HTML comment',
  'front-matter': 'inside the front matter',
  'link-definition': 'inside a link reference definition',
  'container-marker': 'on an admonition or container marker line',
  'attribute-list': 'inside a heading id or attribute list',
  link: 'inside an existing link',
  code: 'inside code',
};

/**
 * The first region overlapping `[start, end)`, or null.
 * @param regions sorted by start, ends ascending (as `PageFacts.protected`)
 */
export function overlappingRegion(regions: readonly ProtectedRegion[], start: number, end: number): ProtectedRegion | null {
  let lo = 0;
  let hi = regions.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (regions[mid][1] <= start) lo = mid + 1;
    else hi = mid;
  }
  const r = regions[lo];
  return r !== undefined && r[0] < end ? r : null;
}

/** A text insertion: `length` code units put in before the original offset `at`. */
export interface Insertion {
  readonly at: number;
  readonly length: number;
}

/**
 * The regions of the original text that the edited text does not hold unchanged (same bytes
 * at the shifted place, same kind), and regions of the edited text that are new (outside the
 * inserted markup), each as original offsets `[start, end)`.
 * @param before regions of the original text
 * @param after regions of the edited text
 * @param insertions what was inserted, ascending by `at`
 */
export function changedRegions(
  before: readonly ProtectedRegion[],
  after: readonly ProtectedRegion[],
  insertions: readonly Insertion[],
): [number, number][] {
  const shiftBefore = (x: number, inclusive: boolean): number => {
    let s = 0;
    for (const ins of insertions) {
      if (ins.at < x || (inclusive && ins.at === x)) s += ins.length;
      else break;
    }
    return s;
  };
  const key = (r: readonly [number, number, string]) => `${r[0]}:${r[1]}:${r[2]}`;
  const afterKeys = new Set(after.map(key));
  const changed: [number, number][] = [];
  const mappedKeys = new Set<string>();
  for (const r of before) {
    const start = r[0] + shiftBefore(r[0], true);
    const mapped: [number, number, string] = [start, start + (r[1] - r[0]), r[2]];
    mappedKeys.add(key(mapped));
    if (!afterKeys.has(key(mapped))) changed.push([r[0], r[1]]);
  }
  // Inserted markup, in edited offsets: its own tags are not new regions of the text.
  const markup: [number, number][] = [];
  let shift = 0;
  for (const ins of insertions) {
    markup.push([ins.at + shift, ins.at + shift + ins.length]);
    shift += ins.length;
  }
  const inMarkup = (s: number, e: number) => markup.some(([ms, me]) => s >= ms && e <= me);
  for (const r of after) {
    if (mappedKeys.has(key(r)) || inMarkup(r[0], r[1])) continue;
    changed.push([toOriginal(r[0], markup), toOriginal(r[1], markup)]);
  }
  return changed;
}

/** An edited offset back to the original text (inside inserted markup: where it was inserted). */
function toOriginal(x: number, markup: readonly [number, number][]): number {
  let removed = 0;
  for (const [s, e] of markup) {
    if (x >= e) removed += e - s;
    else if (x > s) return s - removed;
    else break;
  }
  return x - removed;
}
