import type { HtmlData } from './data.js';
/** The inline parts the page is assembled from, and their CSP hashes. */
export interface PageParts {
    readonly styles: string;
    readonly script: string;
    /** The data JSON, already escaped for a script element. */
    readonly json: string;
    /** `sha256-...` source expressions of the style and the script. */
    readonly styleHash: string;
    readonly scriptHash: string;
}
/**
 * Render the whole page.
 * @param data the report's HTML data
 * @param parts styles, script and data, with their hashes
 */
export declare function renderPage(data: HtmlData, parts: PageParts): string;
