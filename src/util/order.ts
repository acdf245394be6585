/**
 * The output order of findings and suggestions, one definition each: the rules, the report and
 * the baseline sort with these, so every output lists them in the same order.
 */
import type { Finding, Suggestion } from '../types.js';
import { compareText } from './compare.js';

/** Order of findings everywhere in the output: file, line, column, rule, message, target. */
export function compareFindings(a: Finding, b: Finding): number {
  return (
    compareText(a.file, b.file) ||
    a.line - b.line ||
    a.column - b.column ||
    compareText(a.rule, b.rule) ||
    compareText(a.message, b.message) ||
    compareText(a.target ?? '', b.target ?? '')
  );
}

/** Order of suggestions everywhere in the output: file, line, column, target route, id. */
export function compareSuggestions(a: Suggestion, b: Suggestion): number {
  return (
    compareText(a.file, b.file) ||
    a.line - b.line ||
    a.column - b.column ||
    compareText(a.target, b.target) ||
    compareText(a.id, b.id)
  );
}
