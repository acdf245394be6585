import type { Report } from '../types.js';
/** Everything a report depends on, as plain data (hashed, never stored). */
export interface ResultInputs {
    readonly version: string;
    readonly command: string;
    readonly options: unknown;
    readonly sources: readonly {
        readonly path: string;
        readonly hash: string;
        readonly problems: unknown;
    }[];
    readonly rest: unknown;
}
/** A sha256 over the inputs of a report and the code that computes it (`codeHash`). */
export declare function resultKey(inputs: ResultInputs): string;
/** The cached report for `key`, or null (absent, unreadable, foreign or stale). */
export declare function readResult(dir: string, command: string, key: string): Report | null;
/** Store `report` under `key` (temp file + rename). Never throws: a cache that cannot be written is skipped. */
export declare function writeResult(dir: string, command: string, key: string, report: Report): void;
