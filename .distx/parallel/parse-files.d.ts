/** Parse files on the main thread or in a worker pool, by `options.workers` and the file count. */
import type { ResolvedOptions } from '../options.js';
import type { PageFacts, SourceFile } from '../types.js';
import type { WorkerStats } from './types.js';
/** What `parseFiles` needs besides the files and options. */
export interface ParseFilesSettings {
    /** `os.availableParallelism()`, read by the caller. */
    readonly cores: number;
    /** Called with the number of files of each step as it is parsed. */
    readonly onParsed?: (count: number) => void;
}
/**
 * Facts of every file in the order of `files`, identical whichever path parses them: the main
 * thread (`options.workers` 1, or automatic below `AUTO_MIN_FILES` files) or a pool of worker
 * threads (`options.workers` N >= 2, or automatic: one per core).
 */
export declare function parseFiles(files: readonly SourceFile[], options: ResolvedOptions, settings: ParseFilesSettings): Promise<{
    facts: PageFacts[];
    stats: WorkerStats;
}>;
