import type { Formatter } from '../types.js';
/** Escape text for Markdown (ASCII punctuation that could start markup); keeps it on one line. */
export declare function escapeMarkdown(text: string): string;
/** The Markdown formatter. */
export declare const markdownFormatter: Formatter;
