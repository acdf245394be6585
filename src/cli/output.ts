/** Where the report goes: choosing the format from `--output`, and refusing unsafe targets. */
import fs from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { kindOfPath } from '../collect/index.js';
import { EngineError } from '../errors.js';
import type { FormatName } from './args.js';

/** The format a report file's extension implies (`.json`, `.md`, `.sarif`, `.html`), else text. */
export function formatFromOutput(path: string): FormatName {
  const name = basename(path).toLowerCase();
  if (name.endsWith('.sarif') || name.endsWith('.sarif.json')) return 'sarif';
  if (name.endsWith('.json')) return 'json';
  if (name.endsWith('.md') || name.endsWith('.markdown')) return 'markdown';
  if (name.endsWith('.html') || name.endsWith('.htm')) return 'html';
  return 'text';
}

/**
 * Refuse an `--output` that would overwrite a source or be read as one: inside the content root
 * (after resolving symlinks) with a source extension (.md, .markdown, .mdx, .html, .htm).
 * Other files inside the root are allowed: naming them with `--output` is asking for it.
 * @param output absolute path from the flag
 * @param shownPath the path as the user wrote it, for the message
 * @throws EngineError `E_USAGE`
 */
export function checkOutputPath(output: string, root: string, shownPath: string): void {
  const realRoot = realOrNull(root);
  if (realRoot === null) return; // analyze reports a missing root
  const target = realTarget(output);
  const inside = target === realRoot || target.startsWith(realRoot.endsWith('/') ? realRoot : `${realRoot}/`);
  if (inside && kindOfPath(target) !== null) {
    throw new EngineError(
      'E_USAGE',
      `flag --output: refusing to write "${shownPath}": it is inside the content root with a source extension, so it could overwrite a page or be read as one; write the report outside the root or use another extension`,
    );
  }
}

/** Real path of `path`, resolving the nearest existing ancestor when it does not exist yet. */
function realTarget(path: string): string {
  const real = realOrNull(path);
  if (real !== null) return real;
  const parent = dirname(path);
  return parent === path ? path : join(realTarget(parent), basename(path));
}

function realOrNull(path: string): string | null {
  try {
    return fs.realpathSync(path);
  } catch {
    return null;
  }
}
