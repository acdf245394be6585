/**
 * Literal values from JavaScript/TypeScript config files, found by a careful static scan. The
 * site's code is never executed: a key counts only when its value is a plain string, number or
 * boolean literal (or an array / object of literals); anything else (a variable, a call, a
 * template with `${}`) is "not static" and the caller uses the default and says so.
 */

/** Comments removed, strings kept (so `//` inside a string is not a comment). */
export function stripComments(src: string): string {
  let out = '';
  for (let i = 0; i < src.length; i++) {
    const c = src[i];
    if (c === '"' || c === "'" || c === '`') {
      const end = stringEnd(src, i);
      out += src.slice(i, end);
      i = end - 1;
    } else if (c === '/' && src[i + 1] === '/') {
      while (i < src.length && src[i] !== '\n') i++;
      out += '\n';
    } else if (c === '/' && src[i + 1] === '*') {
      const end = src.indexOf('*/', i + 2);
      const skipped = src.slice(i, end < 0 ? src.length : end + 2);
      out += skipped.replace(/[^\n]/g, ' ');
      i = (end < 0 ? src.length : end + 2) - 1;
    } else out += c;
  }
  return out;
}

function stringEnd(src: string, start: number): number {
  const quote = src[start];
  for (let i = start + 1; i < src.length; i++) {
    if (src[i] === '\\') i++;
    else if (src[i] === quote) return i + 1;
    else if (quote !== '`' && src[i] === '\n') return i;
  }
  return src.length;
}

/** A key's value found in the source: a literal, or not static. */
export type StaticValue = { readonly kind: 'literal'; readonly value: unknown } | { readonly kind: 'dynamic'; readonly text: string } | null;

/**
 * The value of the first `key: value` (or `key = value`) in the source, when it is a literal.
 * @returns null when the key is not there
 */
export function staticValue(src: string, key: string): StaticValue {
  const code = stripComments(src);
  const re = new RegExp(`(?:^|[\\s,{(])["']?${key}["']?\\s*[:=]\\s*`, 'm');
  const m = re.exec(code);
  if (m === null) return null;
  const at = m.index + m[0].length;
  const parsed = literalAt(code, at);
  if (parsed === null) return { kind: 'dynamic', text: code.slice(at, at + 40).split('\n')[0].trim() };
  return { kind: 'literal', value: parsed.value };
}

/** Parse a literal (string, number, boolean, null, array or object of literals) at `at`. */
export function literalAt(src: string, at: number): { value: unknown; end: number } | null {
  let i = skipSpace(src, at);
  const c = src[i];
  if (c === '"' || c === "'" || c === '`') {
    const end = stringEnd(src, i);
    const body = src.slice(i + 1, end - 1);
    if (c === '`' && body.includes('${')) return null;
    try {
      return { value: c === '"' ? JSON.parse(src.slice(i, end)) : unescape(body), end };
    } catch {
      return null;
    }
  }
  if (c === '[') {
    const items: unknown[] = [];
    i++;
    for (;;) {
      i = skipSpace(src, i);
      if (src[i] === ']') return { value: items, end: i + 1 };
      const item = literalAt(src, i);
      if (item === null) return null;
      items.push(item.value);
      i = skipSpace(src, item.end);
      if (src[i] === ',') i++;
      else if (src[i] !== ']') return null;
    }
  }
  if (c === '{') {
    const obj: Record<string, unknown> = {};
    i++;
    for (;;) {
      i = skipSpace(src, i);
      if (src[i] === '}') return { value: obj, end: i + 1 };
      const key = /^(?:"([^"]*)"|'([^']*)'|([A-Za-z_$][\w$]*))\s*:/.exec(src.slice(i, i + 200));
      if (key === null) return null;
      const value = literalAt(src, i + key[0].length);
      if (value === null) return null;
      obj[key[1] ?? key[2] ?? key[3]] = value.value;
      i = skipSpace(src, value.end);
      if (src[i] === ',') i++;
      else if (src[i] !== '}') return null;
    }
  }
  const m = /^(?:true|false|null|-?\d+(?:\.\d+)?)(?![\w$.(])/.exec(src.slice(i, i + 40));
  if (m === null) return null;
  return { value: JSON.parse(m[0]), end: i + m[0].length };
}

function skipSpace(src: string, i: number): number {
  while (i < src.length && /\s/.test(src[i])) i++;
  return i;
}

function unescape(body: string): string {
  return body.replace(/\\(.)/g, (_, ch: string) => (ch === 'n' ? '\n' : ch === 't' ? '\t' : ch));
}
