/**
 * Escaping for the HTML report. Every text that comes from the report (titles, file names,
 * link texts, messages) is untrusted: it goes through `escapeHtml` when it is written into
 * markup, and through `jsonForScript` when it is embedded as data.
 */
/**
 * Escape a text for use as element content or as a quoted attribute value.
 * @param text any text from the report
 * @returns the text with `& < > " '` replaced by character references
 */
export declare function escapeHtml(text: string): string;
/**
 * Serialise a value as JSON that is safe inside `<script type="application/json">`.
 * `<`, `>` and `&` become `\u003c`, `\u003e`, `\u0026`, so neither `</script` nor `<!--` can
 * appear in the element's text; U+2028 and U+2029 are escaped too. `JSON.parse` of the
 * element's text gives the value back unchanged.
 * @param value a JSON-serialisable value
 */
export declare function jsonForScript(value: unknown): string;
/**
 * Format a number with a fixed count of significant digits, without exponent notation for the
 * ranges a report shows, and with trailing zeros removed (`0.0123`, `1.5`, `12`).
 * @param value the number
 * @param digits significant digits (default 3)
 */
export declare function formatNumber(value: number, digits?: number): string;
