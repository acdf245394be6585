/** File names looked for, in order, in the content root and then in the working folder. */
export declare const CONFIG_FILE_NAMES: readonly ['linkweave.config.json', 'linkweave.config.mjs'];
/** A configuration as loaded, before validation. */
export interface LoadedConfig {
    /** The object as written ({} when there is no configuration). */
    readonly config: unknown;
    /** Where it came from, as error messages name it: a path (relative to the working folder when inside it), `package.json#linkweave`, or `defaults`. */
    readonly origin: string;
    /** Absolute path of the file read, or null. */
    readonly file: string | null;
}
/**
 * Load the configuration: `explicit` (the --config flag) if given, else the first of
 * `linkweave.config.json`, `linkweave.config.mjs` in `root` then in `cwd`, else the `linkweave`
 * key of `package.json` in `root` then in `cwd`, else `{}`.
 * @throws EngineError `E_CONFIG_INVALID` (unparsable file, no default export, two config files
 *   side by side) or `E_IO` (the --config file cannot be read), naming the file
 */
export declare function loadConfig(input: {
    explicit: string | null;
    root: string;
    cwd: string;
}): Promise<LoadedConfig>;
/** A path as messages show it: relative to the working folder when inside it. */
export declare function shown(cwd: string, file: string): string;
