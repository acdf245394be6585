import type { LineIndex } from './lines.js';
import type { Read } from './types.js';
/**
 * Read a Markdown text.
 * @param src Markdown source (BOM removed)
 * @param lines its line table
 * @param mdx true for `.mdx` files: top-level `import`/`export` lines are left out like code
 */
export declare function readMarkdownPage(src: string, lines: LineIndex, mdx?: boolean): Read;
