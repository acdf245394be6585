/**
 * The page script's shared part (plain browser JavaScript, kept as a string: the formatter is
 * pure and writes one self-contained file, so the script is inlined, never loaded).
 *
 * It reads the embedded data, builds the adjacency lists and offers small DOM helpers. Text
 * from the report only ever reaches the page through `textContent`, never as markup.
 */
export declare const CLIENT_CORE: string;
