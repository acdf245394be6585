import type { Read } from './types.js';
/**
 * Read an HTML page.
 * @param src HTML source (BOM removed)
 */
export declare function readHtmlPage(src: string): Read;
