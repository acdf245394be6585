/**
 * Escaping for the HTML report. Every text that comes from the report (titles, file names,
 * link texts, messages) is untrusted: it goes through `escapeHtml` when it is written into
 * markup, and through `jsonForScript` when it is embedded as data.
 */

const HTML_ESCAPES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/**
 * Escape a text for use as element content or as a quoted attribute value.
 * @param text any text from the report
 * @returns the text with `& < > " '` replaced by character references
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]);
}

/**
 * Serialise a value as JSON that is safe inside `<script type="application/json">`.
 * `<`, `>` and `&` become `\u003c`, `\u003e`, `\u0026`, so neither `</script` nor `<!--` can
 * appear in the element's text; U+2028 and U+2029 are escaped too. `JSON.parse` of the
 * element's text gives the value back unchanged.
 * @param value a JSON-serialisable value
 */
export function jsonForScript(value: unknown): string {
  return JSON.stringify(value)
    .replace(/</g, '\\u003c')
    .replace(/>/g, '\\u003e')
    .replace(/&/g, '\\u0026')
    .replace(/\u2028/g, '\\u2028')
    .replace(/\u2029/g, '\\u2029');
}

/**
 * Format a number with a fixed count of significant digits, without exponent notation for the
 * ranges a report shows, and with trailing zeros removed (`0.0123`, `1.5`, `12`).
 * @param value the number
 * @param digits significant digits (default 3)
 */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  if (Number.isInteger(value) && Math.abs(value) >= 10 ** (digits - 1)) return String(value);
  const fixed = Number(value.toPrecision(digits));
  const text = Math.abs(fixed) < 1e-6 ? fixed.toExponential(digits - 1) : String(fixed);
  return text;
}
