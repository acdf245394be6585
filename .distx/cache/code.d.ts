/**
 * A sha256 (hex) of the package's code as it runs: every `.js` file under the package's built
 * folder (`dist/`), or every `.ts` file under `src/` when the sources are run directly (the
 * test runner), each with its path. Read once per process and remembered. Where this module is
 * not in its own folder layout (the package bundled into another file), the file this module
 * was loaded from is hashed instead.
 */
export declare function codeHash(): string;
/** The version string the caches store and require: the tool's version and the code's hash. */
export declare function codeVersion(version: string): string;
