/** Types of the `collect` stage (the only stage that reads source files). */
import type { SourceFile } from '../types.js';
/** Something that kept a file out of the run, found while listing or reading. */
export interface CollectWarning {
    /** Path relative to the content root, `/` separators. */
    readonly file: string;
    readonly code: 'symlink-outside' | 'symlink-loop' | 'unreadable' | 'vanished';
    readonly message: string;
}
/** What `collectSources` found under the content root. */
export interface CollectResult {
    /** Source files sorted by path; text decoded (UTF-8 with replacement, BOM stripped). */
    readonly files: SourceFile[];
    /** Other files under the root (relative posix paths, sorted): images, PDFs... */
    readonly assets: string[];
    /** Sorted by file, then code. */
    readonly warnings: CollectWarning[];
}
