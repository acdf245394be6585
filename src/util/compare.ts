/** String order for output: code-unit order, the same on every machine (unlike `localeCompare`). */

/** Code-unit order of two strings: negative, zero or positive, as `Array.prototype.sort` wants. */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
