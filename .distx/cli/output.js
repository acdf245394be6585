/** Where the report goes: choosing the format from `--output`, and refusing unsafe targets. */
import fs from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { kindOfPath } from '../collect/index.js';
import { EngineError } from '../errors.js';
import { formatters } from '../report/format.js';
/** Extensions that imply a format beyond each formatter's own `fileExtension`. */
const EXTRA_EXTENSIONS = [
    ['.sarif.json', 'sarif'],
    ['.markdown', 'markdown'],
    ['.htm', 'html'],
];
/**
 * The format a report file's name implies: a formatter's `fileExtension` (`.json`, `.md`,
 * `.sarif`, `.html`, `.txt`) or `.sarif.json`, `.markdown`, `.htm`; else text.
 */
export function formatFromOutput(path) {
    const name = basename(path).toLowerCase();
    for (const [ext, id] of EXTRA_EXTENSIONS)
        if (name.endsWith(ext))
            return id;
    for (const f of Object.values(formatters))
        if (name.endsWith(f.fileExtension))
            return f.id;
    return 'text';
}
/**
 * Refuse an `--output` that would overwrite a source or be read as one: inside the content root
 * (after resolving symlinks) with a source extension (.md, .markdown, .mdx, .html, .htm).
 * Other files inside the root are allowed: naming them with `--output` is asking for it.
 * @param output absolute path from the flag
 * @param shownPath the path as the user wrote it, for the message
 * @param flag the flag that named the file, for the message
 * @throws EngineError `E_USAGE`
 */
export function checkOutputPath(output, root, shownPath, flag = 'output') {
    const realRoot = realOrNull(root);
    if (realRoot === null)
        return; // analyze reports a missing root
    const target = realTarget(output);
    const inside = target === realRoot || target.startsWith(realRoot.endsWith('/') ? realRoot : `${realRoot}/`);
    if (inside && kindOfPath(target) !== null) {
        throw new EngineError('E_USAGE', `flag --${flag}: refusing to write "${shownPath}": it is inside the content root with a source extension, so it could overwrite a page or be read as one; write the ${flag === 'output' ? 'report' : 'file'} outside the root or use another extension`);
    }
}
/** Real path of `path`, resolving the nearest existing ancestor when it does not exist yet. */
function realTarget(path) {
    const real = realOrNull(path);
    if (real !== null)
        return real;
    const parent = dirname(path);
    return parent === path ? path : join(realTarget(parent), basename(path));
}
function realOrNull(path) {
    try {
        return fs.realpathSync(path);
    }
    catch {
        return null;
    }
}
