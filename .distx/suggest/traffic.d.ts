/**
 * The traffic CSV (DESIGN section 7): `route,views` per line, an optional header line, `#`
 * comment lines and blank lines allowed. A route is a site path (`/guide/install/`) or a full
 * URL (its path is taken, as analytics exports write them); views is a non-negative number.
 * Fields may be double-quoted (`"…"`, with `""` for a quote). A route listed twice adds up.
 * A bad row is reported with its line and skipped; the rest is kept.
 */
/** What `parseTraffic` found: views per route, and the rows it could not use. */
export interface TrafficResult {
    readonly views: Map<string, number>;
    readonly problems: {
        readonly line: number;
        readonly message: string;
    }[];
}
/**
 * Parse a traffic CSV.
 * @param _file path of the CSV; problems carry only the line, the caller attaches the file
 * @param text its decoded text
 */
export declare function parseTraffic(_file: string, text: string): TrafficResult;
