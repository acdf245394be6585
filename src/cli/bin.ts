#!/usr/bin/env node
/**
 * The `linkweave` executable. Runs the command (`main.ts`) in this process, or, when Node's
 * default heap limit is well below what the machine has (`heapLimitToAsk`), in a child process
 * started with a larger one: the same arguments, working folder, terminal and environment. This
 * process then only passes on the signals it gets and ends with the child's exit code.
 */
import { spawn } from 'node:child_process';
import { constants, totalmem } from 'node:os';
import { fileURLToPath } from 'node:url';
import { getHeapStatistics } from 'node:v8';
import { HEAP_ENV, heapLimitToAsk } from './heap.js';

const constrained = (process as { constrainedMemory?: () => number | undefined }).constrainedMemory?.();
const ask = heapLimitToAsk({ limit: getHeapStatistics().heap_size_limit, memory: totalmem(), constrained, execArgv: process.execArgv, env: process.env });

if (ask === null) {
  await import('./main.js');
} else {
  const main = fileURLToPath(new URL('./main.js', import.meta.url));
  const child = spawn(process.execPath, [...process.execArgv, `--max-old-space-size=${ask}`, main, ...process.argv.slice(2)], {
    stdio: 'inherit',
    env: { ...process.env, [HEAP_ENV]: String(ask) },
  });
  const signals = ['SIGINT', 'SIGTERM', 'SIGHUP'] as const;
  for (const signal of signals) process.on(signal, () => child.kill(signal));
  child.on('error', (error) => {
    process.stderr.write(`linkweave: could not start the command with a ${ask} MiB heap: ${error.message}\n`);
    process.exitCode = 2;
  });
  child.on('exit', (code, signal) => {
    // Ended by a signal it did not handle (say the system's out-of-memory killer): the code a
    // shell gives that, 128 + the signal's number.
    process.exitCode = signal === null ? (code ?? 2) : 128 + (constants.signals[signal] ?? 0);
  });
}
