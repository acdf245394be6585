/** `formatReport`: the built-in formatters by id. */
import { EngineError } from '../errors.js';
import type { Report } from '../types.js';
import { htmlFormatter } from './html/format.js';
import { jsonFormatter } from './formatters/json.js';
import { markdownFormatter } from './formatters/markdown.js';
import { sarifFormatter } from './formatters/sarif.js';
import { textFormatter } from './formatters/text.js';
import type { FormatContext, FormatId, Formatter } from './types.js';

/** The built-in formatters, by id. */
export const formatters: Readonly<Record<FormatId, Formatter>> = {
  text: textFormatter,
  json: jsonFormatter,
  markdown: markdownFormatter,
  sarif: sarifFormatter,
  html: htmlFormatter,
};

/** The formatter ids, for messages and flag validation. */
export const FORMAT_IDS = Object.keys(formatters) as FormatId[];

/** True when `id` names a built-in formatter. */
export function isFormatId(id: string): id is FormatId {
  return Object.hasOwn(formatters, id);
}

/**
 * Turn a report into text in the format `id`.
 * @param ctx formatter context; `color` defaults to false
 * @throws EngineError `E_USAGE` for an unknown format id, listing the known ones
 */
export function formatReport(report: Report, id: FormatId, ctx: Partial<FormatContext> = {}): string {
  return formatterOf(id).format(report, { color: false, ...ctx });
}

/**
 * The same text as {@link formatReport}, in pieces made as they are read, to write one after
 * another: use this for files and streams, since the JSON of a very large site does not fit in
 * one string.
 * @throws EngineError `E_USAGE` for an unknown format id, listing the known ones
 */
export function formatReportPieces(report: Report, id: FormatId, ctx: Partial<FormatContext> = {}): Iterable<string> {
  const formatter = formatterOf(id);
  const full = { color: false, ...ctx };
  return formatter.pieces === undefined ? [formatter.format(report, full)] : formatter.pieces(report, full);
}

function formatterOf(id: FormatId): Formatter {
  const formatter = isFormatId(id) ? formatters[id] : undefined;
  if (formatter === undefined) {
    throw new EngineError('E_USAGE', `unknown format "${String(id)}", expected one of ${FORMAT_IDS.map((f) => `"${f}"`).join(', ')}`);
  }
  return formatter;
}
