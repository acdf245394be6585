/** Stable error codes of linkweave. Every thrown error of the tool is an `EngineError`. */
export type ErrorCode = 'E_CONFIG_INVALID' | 'E_USAGE' | 'E_IO' | 'E_NO_ROOT' | 'E_RANK_NO_CONVERGE' | 'E_REPORT_INVALID' | 'E_APPLY_REFUSED' | 'E_INTERNAL'
/** A build plugin's gate failed (the message lists the findings that failed it). */
 | 'E_GATE_FAILED';
/** An error with a stable `code`; the message says what failed and how to fix it. */
export declare class EngineError extends Error {
    readonly code: ErrorCode;
    constructor(code: ErrorCode, message: string, options?: {
        cause?: unknown;
    });
}
/** True when `error` is an EngineError (also across module copies). */
export declare function isEngineError(error: unknown): error is EngineError;
