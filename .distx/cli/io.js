/** True when `env.DEBUG` asks for linkweave's stack traces (`DEBUG=linkweave` or `DEBUG=*`). */
export function debugEnabled(env) {
    return (env.DEBUG ?? '').split(/[\s,]+/).some((d) => d === 'linkweave' || d === '*' || d === 'linkweave*');
}
/** Colour on stdout: only on a terminal, never when NO_COLOR is set to a non-empty value (no-color.org). */
export function colorEnabled(io) {
    const noColor = io.env.NO_COLOR;
    return io.isTTY && (noColor === undefined || noColor === '');
}
