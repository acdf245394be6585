/**
 * One-line messages for configuration errors: the full dotted key, what was given and what the
 * key accepts (the keys of an object, the values of an enum, the range of a number), read from
 * the zod schema itself so the message can never disagree with the validation.
 */
import { z } from 'zod';
/** The schema node a path leads to, through defaults, optionals, pipes, arrays and records. */
function schemaAt(root, path) {
    let node = unwrap(root);
    for (const key of path) {
        if (node instanceof z.ZodObject)
            node = node.shape[String(key)] ?? null;
        else if (node instanceof z.ZodArray)
            node = node.element;
        else if (node instanceof z.ZodRecord)
            node = node.valueType;
        else if (node instanceof z.ZodTuple)
            node = node.def.items[Number(key)] ?? null;
        else
            return null;
        if (node === null)
            return null;
        node = unwrap(node);
    }
    return node;
}
/** Defaults, prefaults, optionals and transforms stand for the schema they wrap. */
function unwrap(node) {
    let n = node;
    for (;;) {
        if (n.description !== undefined)
            return n;
        if (n instanceof z.ZodDefault || n instanceof z.ZodPrefault || n instanceof z.ZodOptional)
            n = n.unwrap();
        else if (n instanceof z.ZodPipe)
            n = n.in;
        else
            return n;
    }
}
/**
 * What a schema node accepts, in words: `a whole number >= 0`, `a number from 0 to 1`,
 * `one of "a", "b"`, `a list of non-empty strings`, `true or false`... A node's `.describe()`
 * text wins.
 */
export function describeAccepted(node) {
    const n = unwrap(node);
    if (n.description !== undefined)
        return n.description;
    if (n instanceof z.ZodNullable)
        return `${describeAccepted(n.unwrap())}, or null`;
    if (n instanceof z.ZodEnum)
        return `one of ${n.options.map((v) => JSON.stringify(v)).join(', ')}`;
    if (n instanceof z.ZodBoolean)
        return 'true or false';
    if (n instanceof z.ZodNumber)
        return describeNumber(n);
    if (n instanceof z.ZodString)
        return n.minLength !== null && n.minLength > 0 ? 'a non-empty string' : 'a string';
    if (n instanceof z.ZodArray) {
        const min = (n.def.checks ?? []).map((c) => c._zod.def).find((d) => d.check === 'min_length');
        const element = describeAccepted(n.element).replace(/^an? /, '').replace(/\b(string|object|number)\b/, '$1s');
        return `a list of ${element}${min?.minimum ? ` (at least ${min.minimum})` : ''}`;
    }
    if (n instanceof z.ZodObject)
        return `an object with the keys ${Object.keys(n.shape).join(', ')}`;
    if (n instanceof z.ZodRecord)
        return 'an object';
    if (n instanceof z.ZodUnion)
        return n.options.map((o) => describeAccepted(o)).join(', or ');
    if (n instanceof z.ZodTuple)
        return `[${n.def.items.map((i) => describeAccepted(i)).join(', ')}]`;
    return n.def.type;
}
function describeNumber(n) {
    const what = n.isInt ? 'a whole number' : 'a number';
    let low = null;
    let high = null;
    for (const check of n.def.checks ?? []) {
        const d = check._zod.def;
        if (d.check === 'greater_than')
            low = { value: d.value, inclusive: d.inclusive === true };
        if (d.check === 'less_than')
            high = { value: d.value, inclusive: d.inclusive === true };
    }
    if (low !== null && high !== null && low.inclusive && high.inclusive)
        return `${what} from ${low.value} to ${high.value}`;
    const parts = [];
    if (low !== null)
        parts.push(`${low.inclusive ? '>=' : '>'} ${low.value}`);
    if (high !== null)
        parts.push(`${high.inclusive ? '<=' : '<'} ${high.value}`);
    return parts.length === 0 ? what : `${what} ${parts.join(' and ')}`;
}
/** A given value, short, for a message. */
function shown(value) {
    if (value === undefined)
        return 'nothing';
    if (Array.isArray(value))
        return value.length === 0 ? 'an empty list' : `a list of ${value.length}`;
    const text = value !== null && typeof value === 'object' ? 'an object' : JSON.stringify(value);
    return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}
/**
 * One line for the first issue of a failed parse of `schema`: `key "routes.styel": unknown key;
 * accepted keys of "routes": style, basePath, ...` or `key "maxDepth": expected a whole number
 * >= 0, got -1`. The caller prefixes where the configuration came from.
 * @param issue an issue of `schema.safeParse(input, { reportInput: true })`
 */
export function describeIssue(schema, issue) {
    const path = issue.path;
    const dotted = (p) => p.map(String).join('.');
    if (issue.code === 'unrecognized_keys') {
        const node = schemaAt(schema, path);
        const [first, ...more] = issue.keys;
        const owner = path.length === 0 ? 'accepted keys' : `accepted keys of "${dotted(path)}"`;
        const keys = node instanceof z.ZodObject ? Object.keys(node.shape).join(', ') : '';
        const also = more.length > 0 ? ` (also unknown: ${more.map((k) => `"${k}"`).join(', ')})` : '';
        return `key "${dotted([...path, first])}": unknown key${also}; ${owner}: ${keys}`;
    }
    if (path.length === 0 && issue.code === 'invalid_type') {
        return `the configuration must be an object of keys, got ${'input' in issue ? shown(issue.input) : 'nothing'}`;
    }
    return `key "${dotted(path)}": ${expectedGot(schema, issue)}`;
}
/**
 * `expected <what the key accepts>, got <the value>` for an issue of `schema` (parsed with
 * `reportInput: true`) other than an unknown key.
 */
export function expectedGot(schema, issue) {
    const node = schemaAt(schema, issue.path);
    const expected = node === null ? issue.message : describeAccepted(node);
    return `expected ${expected}, got ${'input' in issue ? shown(issue.input) : 'nothing'}`;
}
