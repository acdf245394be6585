/**
 * Include directives: text a site generator pulls into a page from another file when it builds
 * the site. The included text is part of the page (its ids are the page's ids), so the graph
 * stage needs to know which file each page pulls in.
 *
 * - mdBook: `{{#include path}}`, `{{#rustdoc_include path}}` (a `:anchor` or `:from:to` suffix
 *   is cut off);
 * - MkDocs (pymdownx snippets): a line `--8<-- "path"` (single or double quotes);
 * - Hugo: `{{< include "path" >}}`, `{{% include "path" %}}`, `{{< readfile file="path" >}}`;
 * - Jekyll: `{% include path %}` (from `_includes/`) and `{% include_relative path %}`.
 *
 * Directives inside code (a fenced listing whose body is an included source file) add no ids
 * or links to the page and are left out. Pure: paths are only computed here, the graph stage
 * looks them up.
 */
import type { IncludeRef } from '../types.js';
import type { LineIndex } from '../util/line-index.js';
import { positionOf } from '../util/line-index.js';

const QUICK = /\{\{#|--8<--|\{\{[<%]|\{%-?\s*include/;
type From = 'file' | 'root' | 'includes' | 'snippets';
const DIRECTIVES: readonly { readonly re: RegExp; readonly from: From }[] = [
  { re: /\{\{#(?:include|rustdoc_include)\s+([^\s}]+)[^}]*\}\}/g, from: 'file' },
  { re: /^[ \t]*-{2,}8<-{2,}[ \t]+["']([^"'\n]+)["']/gm, from: 'snippets' },
  { re: /\{\{[<%]\s*(?:include|readfile)\s+(?:file\s*=\s*)?["']([^"'\n]+)["'][^}]*[>%]\}\}/g, from: 'root' },
  { re: /\{%-?\s*include_relative\s+([^\s%]+)[^%]*-?%\}/g, from: 'file' },
  { re: /\{%-?\s*include\s+([^\s%{]+)[^%]*-?%\}/g, from: 'includes' },
];

/**
 * The include directives of a page, in source order.
 * @param src the page's text
 * @param path the page's path relative to the content root
 * @param code code ranges `[start, end)` as pairs (the draft's `code`)
 * @param lines line table of `src`
 */
export function findIncludes(src: string, path: string, code: readonly number[], lines: LineIndex): IncludeRef[] {
  if (!QUICK.test(src)) return [];
  const found: { offset: number; ref: IncludeRef }[] = [];
  const folder = path.includes('/') ? path.slice(0, path.lastIndexOf('/') + 1) : '';
  for (const { re, from } of DIRECTIVES) {
    re.lastIndex = 0;
    for (let m = re.exec(src); m !== null; m = re.exec(src)) {
      if (inCode(code, m.index)) continue;
      let written = m[1].trim();
      if (from !== 'root' && from !== 'includes' && written.startsWith('{{')) continue;
      // mdBook: `file.rs:anchor` or `file.rs:2:10` names a part of the file.
      if (m[0].startsWith('{{#')) written = written.replace(/:.*$/, '');
      if (written === '' || /[{}]/.test(written)) continue;
      const paths = candidates(written, folder, from);
      if (paths.length === 0) continue;
      found.push({ offset: m.index, ref: { written, paths, ...positionOf(lines, m.index) } });
    }
  }
  found.sort((a, b) => a.offset - b.offset);
  return found.map((f) => f.ref);
}

function candidates(written: string, folder: string, from: From): string[] {
  const out: string[] = [];
  const add = (p: string | null) => {
    if (p !== null && !out.includes(p)) out.push(p);
  };
  const absolute = written.startsWith('/');
  const bare = written.replace(/^\/+/, '');
  if (from === 'includes') {
    add(normalize(`_includes/${bare}`));
    return out;
  }
  if (from === 'root' || absolute) {
    add(normalize(bare));
    // Hugo reads include paths against the project folder, one above `content/`, or more when
    // the content folder is deeper (`content/en/`): the path less its first segments.
    add(normalize(`../${bare}`));
    if (!absolute) add(normalize(folder + bare));
    if (from === 'root') {
      const segments = bare.split('/');
      for (let i = 1; i < segments.length - 1; i++) add(normalize(segments.slice(i).join('/')));
    }
    return out;
  }
  add(normalize(folder + bare));
  // MkDocs snippets are read against the project folder too (its `base_path`, default `.`),
  // which holds the docs folder (`docs/`, or deeper: `doc/docs/`): the path less its first segments.
  add(normalize(bare));
  add(normalize(`../${bare}`));
  if (from === 'snippets') {
    const segments = bare.split('/');
    for (let i = 1; i < segments.length - 1; i++) add(normalize(segments.slice(i).join('/')));
  }
  return out;
}

/** Dot segments removed; leading `../` kept (a path above the content root). */
function normalize(path: string): string | null {
  const out: string[] = [];
  let up = 0;
  for (const seg of path.split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') {
      if (out.length > 0) out.pop();
      else up++;
    } else out.push(seg);
  }
  if (out.length === 0) return null;
  return '../'.repeat(up) + out.join('/');
}

function inCode(code: readonly number[], offset: number): boolean {
  for (let i = 0; i + 1 < code.length; i += 2) if (offset >= code[i] && offset < code[i + 1]) return true;
  return false;
}
