import type { Rule } from './types.js';
/** Options of `dead-end`. */
export interface DeadEndOptions {
    /**
     * Count template links (navigation, header, footer) as outlinks. With the default `false`, a
     * page whose only links are the sidebar's is a dead end: the reader finishes the text and finds
     * nowhere to go on but the menu, which every page has.
     * @default false
     */
    readonly countTemplateLinks: boolean;
}
export declare const deadEnd: Rule<DeadEndOptions>;
