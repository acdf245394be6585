/** Where a finding points: helpers shared by the rules. */
import type { PageNode, ResolvedLink } from '../types.js';
import type { RuleContext, RuleFinding } from './types.js';
/** A finding about a whole page: line 1, column 1 of its file. */
export declare function pageFinding(page: PageNode, message: string, target?: string): RuleFinding;
/**
 * File and route a link is written in. Navigation links (`from` -1) belong to the navigation
 * file, which is no page: route `''`.
 */
export declare function linkSource(ctx: RuleContext, link: ResolvedLink): {
    file: string;
    route: string;
};
/** Fragment without its leading `#`. */
export declare function bareFragment(fragment: string): string;
/** A list of routes for a message: at most three, then "and N more". */
export declare function listRoutes(routes: readonly string[]): string;
