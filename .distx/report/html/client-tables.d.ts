/**
 * The page script's tables: findings and suggested links, with sorting (column header buttons,
 * so Enter and Space work as well as clicks; `aria-sort` tells the order) and filters (rule,
 * folder, severity, free text). Long tables show 200 rows with a button for the rest; printing
 * shows every row. Plain browser JavaScript kept as a string (see client-core.ts).
 */
export declare const CLIENT_TABLES: string;
