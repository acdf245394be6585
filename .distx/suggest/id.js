/** Stable suggestion ids: a reviewer accepts a suggestion by id across runs (DESIGN section 8). */
import { createHash } from 'node:crypto';
/**
 * Id of a suggestion: the first 12 hex digits of the sha256 of source route, target route and
 * anchor phrase (empty when there is none), separated by line feeds.
 */
export function suggestionId(source, target, anchor) {
    return createHash('sha256').update(`${source}\n${target}\n${anchor ?? ''}`).digest('hex').slice(0, 12);
}
