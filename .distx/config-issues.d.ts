/**
 * One-line messages for configuration errors: the full dotted key, what was given and what the
 * key accepts (the keys of an object, the values of an enum, the range of a number), read from
 * the zod schema itself so the message can never disagree with the validation.
 */
import { z } from 'zod';
/**
 * What a schema node accepts, in words: `a whole number >= 0`, `a number from 0 to 1`,
 * `one of "a", "b"`, `a list of non-empty strings`, `true or false`... A node's `.describe()`
 * text wins.
 */
export declare function describeAccepted(node: z.ZodType): string;
/**
 * One line for the first issue of a failed parse of `schema`: `key "routes.styel": unknown key;
 * accepted keys of "routes": style, basePath, ...` or `key "maxDepth": expected a whole number
 * >= 0, got -1`. The caller prefixes where the configuration came from.
 * @param issue an issue of `schema.safeParse(input, { reportInput: true })`
 */
export declare function describeIssue(schema: z.ZodType, issue: z.core.$ZodIssue): string;
/**
 * `expected <what the key accepts>, got <the value>` for an issue of `schema` (parsed with
 * `reportInput: true`) other than an unknown key.
 */
export declare function expectedGot(schema: z.ZodType, issue: z.core.$ZodIssue): string;
