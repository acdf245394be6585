/** An error with a stable `code`; the message says what failed and how to fix it. */
export class EngineError extends Error {
    code;
    constructor(code, message, options) {
        super(message, options);
        this.name = 'EngineError';
        this.code = code;
    }
}
/** True when `error` is an EngineError (also across module copies). */
export function isEngineError(error) {
    return error instanceof Error && error.name === 'EngineError' && 'code' in error;
}
