/**
 * Id of a suggestion: the first 12 hex digits of the sha256 of source route, target route and
 * anchor phrase (empty when there is none), separated by line feeds.
 */
export declare function suggestionId(source: string, target: string, anchor: string | null): string;
