/**
 * `collectSources` as a program (bundled by collect.test.ts with rolldown, so it runs anywhere as
 * any user): the root is the first argument; the file paths and warnings go to stdout as JSON.
 */
import { collectSources } from '../../src/collect/index.js';
import { resolveOptions } from '../../src/config/options.js';

const result = await collectSources(resolveOptions({}, process.argv[2]!));
process.stdout.write(JSON.stringify({ files: result.files.map((f) => f.path), warnings: result.warnings }));
