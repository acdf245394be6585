/** The JSON writer: the report itself, indented, byte-identical for the same report. */
import type { Formatter } from '../types.js';

/** The JSON formatter (the report is already sorted and rounded by `buildReport`). */
export const jsonFormatter: Formatter = {
  id: 'json',
  fileExtension: '.json',
  format(report) {
    return `${JSON.stringify(report, null, 2)}\n`;
  },
};
