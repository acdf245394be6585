/** A `.` or `..` segment. */
export declare const DOT_SEGMENT: RegExp;
/**
 * RFC 3986 section 5.2.4 "remove_dot_segments" on an absolute path: `.` segments vanish, `..`
 * removes the segment before it (never above the root), a final `.` or `..` leaves a slash.
 */
export declare function removeDotSegments(path: string): string;
/**
 * `removeDotSegments(dir + rel)` for a folder `dir` (`/a/b/`) and a relative path, with the
 * usual leading `./` and `../` taken off by string slicing (no split and join).
 */
export declare function joinPath(dir: string, rel: string): string;
/** `/a/index.html` and `/a/index.htm` stand for `/a/` (as `canonicalPath` does). */
export declare function stripIndexFile(path: string): string;
/** Decoded file path (relative to the content root) of a URL path; null when it does not decode. */
export declare function filePathOf(pathname: string): string | null;
/** Decoded fragment without `#`; null when it does not decode or holds a NUL. */
export declare function decodeFragment(hash: string): string | null;
/** The path part of an href: before the first `?` or `#`. */
export declare function pathPart(href: string): string;
