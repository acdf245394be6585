/**
 * Finding and loading the configuration file for the CLI. Validation itself is
 * `resolveOptions` (options.ts in this folder); this file only finds the file and reads its object.
 */
import fs from 'node:fs';
import { extname, isAbsolute, join, relative, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { EngineError } from '../errors.js';

/** File names looked for, in order, in the content root and then in the working folder. */
export const CONFIG_FILE_NAMES = ['linkweave.config.json', 'linkweave.config.mjs'] as const;

/** A configuration as loaded, before validation. */
export interface LoadedConfig {
  /** The object as written ({} when there is no configuration). */
  readonly config: unknown;
  /** Where it came from, as error messages name it: a path (relative to the working folder when inside it), `package.json#linkweave`, or `defaults`. */
  readonly origin: string;
  /** Absolute path of the file read, or null. */
  readonly file: string | null;
}

/**
 * Load the configuration: `explicit` (the --config flag) if given, else the first of
 * `linkweave.config.json`, `linkweave.config.mjs` in `root` then in `cwd`, else the `linkweave`
 * key of `package.json` in `root` then in `cwd`, else `{}`.
 * @throws EngineError `E_CONFIG_INVALID` (unparsable file, no default export, two config files
 *   side by side) or `E_IO` (the --config file cannot be read), naming the file
 */
export async function loadConfig(input: { explicit: string | null; root: string; cwd: string }): Promise<LoadedConfig> {
  const { explicit, root, cwd } = input;
  if (explicit !== null) {
    const file = resolve(cwd, explicit);
    const ext = extname(file).toLowerCase();
    if (!['.json', '.mjs', '.js', '.cjs'].includes(ext)) {
      throw new EngineError('E_USAGE', `flag --config: expected a .json, .mjs, .js or .cjs file; got "${explicit}"`);
    }
    if (!isFile(file)) throw new EngineError('E_IO', `flag --config: cannot read "${explicit}": no such file`);
    return { config: await readConfigFile(file, shown(cwd, file)), origin: shown(cwd, file), file };
  }
  const folders = [...new Set([resolve(root), resolve(cwd)])];
  for (const dir of folders) {
    const present = CONFIG_FILE_NAMES.map((n) => join(dir, n)).filter(isFile);
    if (present.length > 1) {
      throw new EngineError(
        'E_CONFIG_INVALID',
        `${present.map((p) => `"${shown(cwd, p)}"`).join(' and ')} both exist; keep one configuration file`,
      );
    }
    if (present.length === 1) {
      const file = present[0];
      return { config: await readConfigFile(file, shown(cwd, file)), origin: shown(cwd, file), file };
    }
  }
  for (const dir of folders) {
    const file = join(dir, 'package.json');
    if (!isFile(file)) continue;
    const pkg = parseJson(fs.readFileSync(file, 'utf8'), shown(cwd, file));
    if (pkg !== null && typeof pkg === 'object' && 'linkweave' in pkg) {
      const origin = `${shown(cwd, file)}#linkweave`;
      return { config: (pkg as { linkweave: unknown }).linkweave, origin, file };
    }
  }
  return { config: {}, origin: 'defaults', file: null };
}

async function readConfigFile(file: string, origin: string): Promise<unknown> {
  if (extname(file).toLowerCase() === '.json') {
    let text: string;
    try {
      text = fs.readFileSync(file, 'utf8');
    } catch (error) {
      throw new EngineError('E_IO', `${origin}: cannot read: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
    }
    return parseJson(text, origin);
  }
  let module: { default?: unknown };
  try {
    module = (await import(pathToFileURL(file).href)) as { default?: unknown };
  } catch (error) {
    throw new EngineError('E_CONFIG_INVALID', `${origin}: cannot load: ${firstLine((error as Error).message)}`);
  }
  if (!('default' in module) || module.default === undefined) {
    throw new EngineError('E_CONFIG_INVALID', `${origin}: no default export; write \`export default { ... }\``);
  }
  return module.default;
}

function parseJson(text: string, origin: string): unknown {
  try {
    return JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    throw new EngineError('E_CONFIG_INVALID', `${origin}: not valid JSON: ${firstLine((error as Error).message)}`);
  }
}

function isFile(path: string): boolean {
  try {
    return fs.statSync(path).isFile();
  } catch {
    return false;
  }
}

/** A path as messages show it: relative to the working folder when inside it. */
export function shown(cwd: string, file: string): string {
  const rel = relative(cwd, file);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel) ? rel.split('\\').join('/') : file;
}

function firstLine(text: string): string {
  return text.split('\n', 1)[0];
}
