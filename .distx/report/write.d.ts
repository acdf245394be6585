/** Prefix of every temp file (dot-file: never collected; listed in .gitignore). */
export declare const TEMP_PREFIX = ".linkweave-tmp-";
/**
 * Where in-flight temp files are recorded, so a signal handler can remove them before the
 * process exits. A `Set<string>` is one. Owned by the caller (the CLI), never module state.
 */
export interface TempFileTracker {
    add(path: string): unknown;
    delete(path: string): unknown;
}
/** Options of `writeFileAtomic`. */
export interface WriteOptions {
    /** Records the temp file while it exists. @default none */
    readonly tracker?: TempFileTracker;
    /** How error messages name the file (e.g. the path as the user wrote it). @default the `path` argument */
    readonly label?: string;
}
/**
 * Write `data` (text, bytes, or text in pieces written one after another) to `path` atomically:
 * temp file in the same folder (created if needed), flushed,
 * then renamed over `path`. An existing file keeps its permission bits. On any error the temp
 * file is removed and the target is left as it was.
 * @throws EngineError `E_IO` naming the path and the reason
 */
export declare function writeFileAtomic(path: string, data: string | Uint8Array | Iterable<string>, options?: WriteOptions): Promise<void>;
/**
 * Remove temp files still in flight (for a signal handler: synchronous, never throws).
 * @param paths the tracker's current contents
 */
export declare function removeTempFilesSync(paths: Iterable<string>): void;
