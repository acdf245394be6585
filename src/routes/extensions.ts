/**
 * The source extensions: which files are pages, and of which kind. The one list every stage
 * reads (collect's file kinds, the default `include` glob, route style, link patterns, names).
 */
import type { FileKind } from '../types.js';

/** Markdown source extensions, lower case, with their dot. */
export const MARKDOWN_EXTENSIONS = ['.md', '.markdown', '.mdx'] as const;

/** HTML source extensions, lower case, with their dot. */
export const HTML_EXTENSIONS = ['.html', '.htm'] as const;

/** Every source extension, Markdown first. */
export const SOURCE_EXTENSIONS: readonly string[] = [...MARKDOWN_EXTENSIONS, ...HTML_EXTENSIONS];

/** The glob of every source file below a folder: `**\/*.{md,markdown,mdx,html,htm}`. */
export const SOURCE_GLOB = `**/*.{${SOURCE_EXTENSIONS.map((e) => e.slice(1)).join(',')}}`;

const MARKDOWN_SET: ReadonlySet<string> = new Set(MARKDOWN_EXTENSIONS);
const SOURCE_SET: ReadonlySet<string> = new Set(SOURCE_EXTENSIONS);

/** Matches a source extension at the end of a string (any case). */
export const SOURCE_EXTENSION_END = new RegExp(`\\.(?:${SOURCE_EXTENSIONS.map((e) => e.slice(1)).join('|')})$`, 'i');

/** Matches a Markdown extension at the end of a string (any case). */
export const MARKDOWN_EXTENSION_END = new RegExp(`\\.(?:${MARKDOWN_EXTENSIONS.map((e) => e.slice(1)).join('|')})$`, 'i');

/** Matches an HTML extension at the end of a string (any case). */
export const HTML_EXTENSION_END = /\.html?$/i;

/** True for `.md`, `.markdown`, `.mdx`, `.html`, `.htm` (lower case, as `extensionOf` gives). */
export function isSourceExtension(ext: string): boolean {
  return SOURCE_SET.has(ext);
}

/** True for `.md`, `.markdown`, `.mdx` (lower case, as `extensionOf` gives). */
export function isMarkdownExtension(ext: string): boolean {
  return MARKDOWN_SET.has(ext);
}

/** The kind of a lower-case extension with its dot, or null when it is not a source extension. */
export function kindOfExtension(ext: string): FileKind | null {
  if (MARKDOWN_SET.has(ext)) return 'markdown';
  return SOURCE_SET.has(ext) ? 'html' : null;
}

/** Kind of a source file from its extension, or null when it is not a source extension. */
export function kindOfPath(path: string): FileKind | null {
  const dot = path.lastIndexOf('.');
  if (dot < 0 || dot < path.lastIndexOf('/')) return null;
  return kindOfExtension(path.slice(dot).toLowerCase());
}

/**
 * Extension of the last segment of a path, lower-cased, with its dot (`/a/b.PNG` -> `.png`);
 * '' when the last segment has none (or ends in a dot, or starts with its only dot).
 */
export function extensionOf(path: string): string {
  const slash = path.lastIndexOf('/');
  const dot = path.lastIndexOf('.');
  if (dot <= slash + 1 || dot === path.length - 1) return '';
  return path.slice(dot).toLowerCase();
}

/**
 * True when a path names a source file by its extension (`.md`, `.markdown`, `.mdx`, `.html`,
 * `.htm`), ignoring any query or fragment.
 * @param href a link destination or route
 */
export function hasSourceExtension(href: string): boolean {
  const cut = href.search(/[?#]/);
  const path = cut >= 0 ? href.slice(0, cut) : href;
  return SOURCE_EXTENSION_END.test(path);
}
