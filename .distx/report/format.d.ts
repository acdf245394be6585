import type { Report } from '../types.js';
import type { FormatContext, FormatId, Formatter } from './types.js';
/** The built-in formatters, by id. */
export declare const formatters: Readonly<Record<FormatId, Formatter>>;
/** The formatter ids, for messages and flag validation. */
export declare const FORMAT_IDS: FormatId[];
/** True when `id` names a built-in formatter. */
export declare function isFormatId(id: string): id is FormatId;
/**
 * Turn a report into text in the format `id`.
 * @param ctx formatter context; `color` defaults to false
 * @throws EngineError `E_USAGE` for an unknown format id, listing the known ones
 */
export declare function formatReport(report: Report, id: FormatId, ctx?: Partial<FormatContext>): string;
/**
 * The same text as {@link formatReport}, in pieces made as they are read, to write one after
 * another: use this for files and streams, since the JSON of a very large site does not fit in
 * one string.
 * @throws EngineError `E_USAGE` for an unknown format id, listing the known ones
 */
export declare function formatReportPieces(report: Report, id: FormatId, ctx?: Partial<FormatContext>): Iterable<string>;
