/**
 * The `linkweave` command in its process (started by `bin.ts`, in the same process or in a child
 * with a larger heap): hands the process to `run` and sets `process.exitCode`. The only file
 * that exits the process, and only on a signal, after removing the temp files of atomic writes
 * still in flight.
 */
import { removeTempFilesSync } from '../util/write-file.js';
import { run } from './run.js';

const tempFiles = new Set<string>();

function onSignal(signal: 'SIGINT' | 'SIGTERM', code: number): void {
  process.once(signal, () => {
    removeTempFilesSync(tempFiles);
    process.stderr.write(`\nlinkweave: interrupted (${signal})\n`);
    process.exit(code);
  });
}
onSignal('SIGINT', 130);
onSignal('SIGTERM', 143);

// A closed pipe (`linkweave check | head`) is not an error of the run.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code !== 'EPIPE') throw error;
});

run(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  cwd: process.cwd(),
  env: process.env,
  isTTY: process.stdout.isTTY === true,
  ...(process.stdout.columns === undefined ? {} : { columns: process.stdout.columns }),
  stderrIsTTY: process.stderr.isTTY === true,
  tempFiles,
}).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`linkweave: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 2;
  },
);
