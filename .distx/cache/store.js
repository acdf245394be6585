/**
 * Reading and writing the page-facts cache folder (layout in `format.ts`). Owned by one run:
 * `openCache` loads the shard files, `lookup`/`store` answer and record files, `save` rewrites
 * the shards that changed, each atomically (temp file in the same folder, then rename).
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import { CACHE_SCHEMA, packFacts, shardFileName, shardOfPath, SHARDS, unpackFacts } from './format.js';
import { asHeader, isStoredFacts } from './validate.js';
/** Fresh facts waiting to be packed for the shard file (a class, so no entry read from a file can pass for one). */
class Unpacked {
    facts;
    source;
    constructor(facts, source) {
        this.facts = facts;
        this.source = source;
    }
}
const TEMP_PREFIX = '.linkweave-tmp-';
/** Load the shard files of `dir` (a missing folder is an empty cache). */
export function openCache(dir, key) {
    const ignored = [];
    const shards = [];
    for (let i = 0; i < SHARDS; i++) {
        const name = shardFileName(i);
        const read = readShard(join(dir, name), i, key);
        if ('reason' in read)
            ignored.push({ file: name, reason: read.reason });
        shards.push({ loaded: 'entries' in read ? read.entries : new Map(), ignored: 'reason' in read, next: new Map(), stored: 0 });
    }
    return {
        ignored,
        lookup(file) {
            const shard = shards[shardOfPath(file.path)];
            const entry = shard.loaded.get(file.path);
            if (entry === undefined)
                return { miss: 'absent' };
            if (entry.hash !== file.hash)
                return { miss: 'changed' };
            if (!isStoredFacts(entry) || entry.kind !== file.kind)
                return { miss: 'rejected' };
            const facts = unpackFacts(entry, file.text);
            if (facts === null)
                return { miss: 'rejected' };
            shard.next.set(file.path, entry);
            return { facts };
        },
        store(file, facts) {
            const shard = shards[shardOfPath(file.path)];
            shard.next.set(file.path, new Unpacked(facts, file.text));
            shard.stored++;
        },
        save() {
            let written = 0;
            for (let i = 0; i < SHARDS; i++) {
                const shard = shards[i];
                const changed = shard.ignored || shard.stored > 0 || shard.next.size !== shard.loaded.size;
                if (!changed)
                    continue;
                const problem = writeShard(dir, i, key, shard.next);
                if (problem !== null)
                    return { written, warning: `cache not saved in "${dir}": ${problem}` };
                written++;
            }
            return { written, warning: null };
        },
    };
}
function readShard(path, index, key) {
    let bytes;
    try {
        bytes = fs.readFileSync(path);
    }
    catch (error) {
        const code = error.code;
        return code === 'ENOENT' || code === 'ENOTDIR' ? { absent: true } : { reason: 'unreadable' };
    }
    const newline = bytes.indexOf(10);
    if (newline < 0)
        return { reason: 'corrupt' };
    let header;
    try {
        header = asHeader(JSON.parse(bytes.toString('utf8', 0, newline)));
    }
    catch {
        return { reason: 'corrupt' };
    }
    if (header === null || header.schema !== CACHE_SCHEMA)
        return { reason: 'schema' };
    if (header.version !== key.version)
        return { reason: 'version' };
    if (header.fingerprint !== key.fingerprint)
        return { reason: 'fingerprint' };
    if (header.shard !== index)
        return { reason: 'corrupt' };
    let body;
    try {
        body = JSON.parse(bytes.toString('utf8', newline + 1));
    }
    catch {
        return { reason: 'corrupt' };
    }
    if (!Array.isArray(body) || body.length !== header.count)
        return { reason: 'corrupt' };
    const entries = new Map();
    for (const entry of body) {
        // Only the key is read here; the full shape is checked when an entry is used (`lookup`).
        const file = typeof entry === 'object' && entry !== null ? entry.file : undefined;
        if (typeof file !== 'string' || entries.has(file))
            return { reason: 'corrupt' };
        entries.set(file, entry);
    }
    return { entries };
}
/** Serialise and write one shard atomically; the reason on failure, else null. */
function writeShard(dir, index, key, entries) {
    const target = join(dir, shardFileName(index));
    const temp = join(dir, `${TEMP_PREFIX}${shardFileName(index)}-${process.pid}-${randomBytes(6).toString('hex')}`);
    try {
        const data = serializeShard(index, key, entries);
        fs.mkdirSync(dir, { recursive: true });
        fs.writeFileSync(temp, data, { flag: 'wx' });
        fs.renameSync(temp, target);
        return null;
    }
    catch (error) {
        try {
            fs.rmSync(temp, { force: true });
        }
        catch {
            // Nothing more can be done about a temp file that cannot be removed.
        }
        return describe(error);
    }
}
/** The text of a shard file: header line, then the entries sorted by path, one per line. */
function serializeShard(index, key, entries) {
    const paths = [...entries.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
    const header = { schema: CACHE_SCHEMA, version: key.version, fingerprint: key.fingerprint, shard: index, count: paths.length };
    const parts = [JSON.stringify(header), '\n[\n'];
    for (let i = 0; i < paths.length; i++) {
        if (i > 0)
            parts.push(',\n');
        const entry = entries.get(paths[i]);
        parts.push(JSON.stringify(entry instanceof Unpacked ? packFacts(entry.facts, entry.source) : entry));
    }
    parts.push('\n]\n');
    return parts.join('');
}
function describe(error) {
    const code = error.code;
    switch (code) {
        case 'EACCES':
        case 'EPERM':
        case 'EROFS':
            return `permission denied (${code})`;
        case 'ENOTDIR':
        case 'EEXIST':
            return `a part of the path is not a folder (${code})`;
        case 'ENOSPC':
            return 'no space left on the device (ENOSPC)';
        case undefined:
            return error.message;
        default:
            return code;
    }
}
