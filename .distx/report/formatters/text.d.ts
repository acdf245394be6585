import type { Formatter } from '../types.js';
/** The terminal formatter. */
export declare const textFormatter: Formatter;
