/**
 * `parseSource`: one source file in, its `PageFacts` out. Never throws: any failure becomes a
 * problem on the page and whatever could be read is still returned, so one bad file never stops
 * a run.
 */
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, SourceFile } from '../types.js';
/**
 * Parse one source file: route, title, frontmatter, headings and ids, links with positions,
 * text for the term index, and spans where links may be inserted.
 * @param file the file as `collect` read it (text decoded, BOM removed; a leading BOM that is
 *   still there is skipped, and offsets still index `file.text`)
 * @param options resolved options (`routes`, `linkPatterns`, `maxLinksPerPage` are read)
 */
export declare function parseSource(file: SourceFile, options: ResolvedOptions): PageFacts;
