/**
 * The navigation file (DESIGN section 4): a table of contents shown on every page, for sites whose
 * sidebar is not in the sources. Its links become template links from every page.
 *
 * - Markdown (any extension but `.yml`/`.yaml`): every link in it, read by the same extractor as
 *   pages (inline, reference, autolinks, raw HTML).
 * - YAML: nested lists whose items are strings (the link itself), mappings with a link under
 *   `link`, `href`, `path`, `url` or `file` and a text under `title`, `text`, `label` or `name`
 *   (nested lists under any other key are read too), or one-key mappings `Title: link` and
 *   `Section: [ ... ]` as some generators write them.
 */
import { isMap, isScalar, isSeq, parseDocument } from 'yaml';
import type { Node as YamlNode } from 'yaml';
import { EngineError } from '../errors.js';
import type { RawLink } from '../types.js';
import type { LineIndex } from '../util/line-index.js';
import { buildLineIndex, positionOf } from '../util/line-index.js';
import { readMarkdownPage } from './markdown-page.js';

const LINK_KEYS = ['link', 'href', 'path', 'url', 'file'];
const TEXT_KEYS = ['title', 'text', 'label', 'name'];

/**
 * Links of a navigation file, with context `template` and origin `navigation`, positioned in
 * the navigation file, in file order.
 * @param file the navigation file's path (relative to the content root), for messages and to
 *   choose YAML (`.yml`, `.yaml`) or Markdown
 * @param text its content
 * @throws EngineError `E_CONFIG_INVALID` naming the file and line when YAML does not parse
 *   (the file is named in the configuration; a broken one is a configuration error)
 */
export function parseNavigation(file: string, text: string): RawLink[] {
  const src = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const lines = buildLineIndex(src);
  return /\.ya?ml$/i.test(file) ? yamlLinks(file, src, lines) : markdownLinks(src, lines);
}

function markdownLinks(src: string, lines: LineIndex): RawLink[] {
  const { draft } = readMarkdownPage(src, lines);
  return draft.links
    .slice()
    .sort((a, b) => a.offset - b.offset)
    .map((l) => navLink(l.href, l.text, l.offset, lines));
}

function yamlLinks(file: string, src: string, lines: LineIndex): RawLink[] {
  const doc = parseDocument(src, { prettyErrors: false });
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    const at = positionOf(lines, e.pos[0]);
    throw new EngineError('E_CONFIG_INVALID', `${file}:${at.line}:${at.column}: navigation file is not valid YAML (${e.message})`);
  }
  const out: { offset: number; link: RawLink }[] = [];
  const add = (href: string, label: string, offset: number): void => {
    out.push({ offset, link: navLink(href, label, offset, lines) });
  };
  walk(doc.contents, add);
  out.sort((a, b) => a.offset - b.offset);
  return out.map((o) => o.link);
}

function walk(node: unknown, add: (href: string, label: string, offset: number) => void): void {
  if (isSeq(node)) {
    for (const item of node.items) walk(item, add);
    return;
  }
  if (isScalar(node)) {
    if (typeof node.value === 'string' && node.value.trim() !== '') add(node.value.trim(), '', offsetOf(node));
    return;
  }
  if (!isMap(node)) return;
  const pairs = node.items.filter((p) => isScalar(p.key));
  const keyOf = (p: (typeof pairs)[number]): string => String((p.key as { value: unknown }).value);
  const linkPair = pairs.find((p) => LINK_KEYS.includes(keyOf(p)) && isScalar(p.value));
  const textPair = pairs.find((p) => TEXT_KEYS.includes(keyOf(p)) && isScalar(p.value));
  if (linkPair !== undefined) {
    const value = (linkPair.value as { value: unknown }).value;
    if (value !== null && value !== undefined && String(value).trim() !== '') {
      const label = textPair === undefined ? '' : String((textPair.value as { value: unknown }).value ?? '');
      add(String(value).trim(), label.trim(), offsetOf(linkPair.value as YamlNode));
    }
  } else if (pairs.length === 1 && !TEXT_KEYS.includes(keyOf(pairs[0])) && isScalar(pairs[0].value)) {
    // `Title: path/to/page.md`
    const value = (pairs[0].value as { value: unknown }).value;
    if (typeof value === 'string' && value.trim() !== '') add(value.trim(), keyOf(pairs[0]), offsetOf(pairs[0].value as YamlNode));
  }
  for (const p of pairs) {
    if (isSeq(p.value) || isMap(p.value)) walk(p.value, add);
  }
}

function offsetOf(node: YamlNode | null | undefined): number {
  return node?.range?.[0] ?? 0;
}

function navLink(href: string, text: string, offset: number, lines: LineIndex): RawLink {
  const at = positionOf(lines, offset);
  return { href, text, line: at.line, column: at.column, context: 'template', nofollow: false, origin: 'navigation' };
}
