/**
 * A source file from text or bytes a build tool already holds (a vfile's value), made the way
 * `collect` makes one from disk: same decoding, hash, size limit and problems, so the parse
 * stage sees exactly what `analyze` would give it.
 */
import { createHash } from 'node:crypto';
import { decodeSource, kindOfPath } from '../collect/index.js';
import type { ResolvedOptions } from '../config/options.js';
import type { FileKind, SourceFile } from '../types.js';

/**
 * Build the `SourceFile` for `path` from its contents.
 * @param path path relative to the content root, `/` separators
 * @param value the file's text (encoded as UTF-8, as it is on disk) or raw bytes
 * @param fallbackKind the kind when the extension names none (a remark pipeline reads Markdown)
 */
export function sourceFileFrom(
  path: string,
  value: string | Uint8Array,
  options: Pick<ResolvedOptions, 'maxFileBytes'>,
  fallbackKind: FileKind = 'markdown',
): SourceFile {
  const bytes = typeof value === 'string' ? Buffer.from(value, 'utf8') : value;
  const kind = kindOfPath(path) ?? fallbackKind;
  const hash = createHash('sha256').update(bytes).digest('hex');
  if (bytes.length > options.maxFileBytes) {
    const message = `file is ${bytes.length} bytes, over maxFileBytes (${options.maxFileBytes}); not analysed`;
    return { path, kind, bytes: bytes.length, hash, text: '', problems: [{ code: 'too-large', message }] };
  }
  const decoded = decodeSource(bytes);
  return { path, kind, bytes: bytes.length, hash, text: decoded.text, problems: decoded.problems };
}
