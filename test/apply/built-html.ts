/**
 * Reading a generator's built HTML for the build tests: the `<a>` elements of a page, and a
 * page's DOM with every link unwrapped (its children kept), to compare two builds "links aside".
 */
import type { Element, Root, RootContent } from 'hast';
import rehypeParse from 'rehype-parse';
import { unified } from 'unified';

const parser = unified().use(rehypeParse);

/** Parse a built page. */
export function parseHtml(html: string): Root {
  return parser.parse(html);
}

/** Plain text of a node. */
function textOf(node: Root | RootContent): string {
  if (node.type === 'text') return node.value;
  if (node.type === 'element' || node.type === 'root') return node.children.map(textOf).join('');
  return '';
}

/** Every `<a href>` of a page: its href and its text (white space collapsed). */
export function linksOf(tree: Root): { href: string; text: string }[] {
  const out: { href: string; text: string }[] = [];
  const walk = (node: Root | RootContent) => {
    if (node.type === 'element' && node.tagName === 'a' && node.properties.href !== undefined) {
      out.push({ href: String(node.properties.href), text: textOf(node).replace(/\s+/g, ' ').trim() });
    }
    if (node.type === 'element' || node.type === 'root') node.children.forEach(walk);
  };
  walk(tree);
  return out;
}

/** A node of the comparable form: tag, sorted attributes, children; text with white space collapsed. */
type Shape = string | { tag: string; attrs: [string, string][]; children: Shape[] };

/**
 * The page's DOM with every `<a>` element replaced by its children, adjacent texts merged and
 * white space collapsed; comments kept (a comment is part of what the generator wrote).
 */
export function shapeWithoutLinks(tree: Root): Shape[] {
  return shapeChildren(tree.children);
}

function shapeChildren(children: readonly RootContent[]): Shape[] {
  const flat: Shape[] = [];
  const push = (s: Shape) => {
    const last = flat[flat.length - 1];
    if (typeof s === 'string' && typeof last === 'string') flat[flat.length - 1] = last + s;
    else flat.push(s);
  };
  for (const child of children) {
    if (child.type === 'text') push(child.value);
    else if (child.type === 'comment') push({ tag: '#comment', attrs: [['value', child.value]], children: [] });
    else if (child.type === 'element') {
      if (child.tagName === 'a') for (const s of shapeChildren(child.children)) push(s);
      else push(shapeElement(child));
    }
  }
  return flat.map((s) => (typeof s === 'string' ? s.replace(/\s+/g, ' ') : s)).filter((s) => s !== ' ' && s !== '');
}

function shapeElement(el: Element): Shape {
  const attrs = Object.entries(el.properties)
    .map(([k, v]): [string, string] => [k, Array.isArray(v) ? v.join(' ') : String(v)])
    .sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  const children = el.tagName === 'template' ? [] : shapeChildren(el.children);
  return { tag: el.tagName, attrs, children };
}
