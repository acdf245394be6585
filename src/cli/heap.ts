/**
 * The heap limit the command asks for. Node's default (about 4 GB on a 64-bit machine) is below
 * what `suggest` needs on a site of 100,000 pages: that run ended with "JavaScript heap out of
 * memory" after 18 minutes. The limit can only be set when a process starts, so `bin.ts` starts
 * the command in a child process with a larger one when the machine has the memory and nobody
 * chose a limit. Kept free of the command's modules, so deciding costs no more than starting Node.
 */

/** Set in the child's environment (the limit in MiB) so it does not start another; `0` from the user keeps Node's default. */
export const HEAP_ENV = 'LINKWEAVE_HEAP_MB';

/** Share of the machine's memory (or of the container's limit) the heap may grow to. */
export const HEAP_SHARE = 0.75;

/** What the decision reads, from `process`, `os` and `v8`. */
export interface HeapFacts {
  /** Node's heap limit now (`v8.getHeapStatistics().heap_size_limit`), bytes. */
  readonly limit: number;
  /** The machine's memory (`os.totalmem()`), bytes. */
  readonly memory: number;
  /** The container's limit (`process.constrainedMemory()`), bytes; 0, undefined or above `memory` when there is none. */
  readonly constrained: number | undefined;
  readonly execArgv: readonly string[];
  readonly env: Readonly<Record<string, string | undefined>>;
}

/**
 * The heap limit to start the command with, in MiB, or null to run it in this process: when
 * {@link HEAP_ENV} is set (a child, or the user's `0`), when `--max-old-space-size` is given
 * (on the command line or in `NODE_OPTIONS`), or when {@link HEAP_SHARE} of the memory is not a
 * quarter above the present limit.
 */
export function heapLimitToAsk(facts: HeapFacts): number | null {
  if (facts.env[HEAP_ENV] !== undefined) return null;
  const flags = [...facts.execArgv, ...(facts.env.NODE_OPTIONS ?? '').split(/\s+/)];
  if (flags.some((f) => /^--max[-_]old[-_]space[-_]size(?:=|$)/.test(f))) return null;
  const c = facts.constrained;
  const memory = c !== undefined && c > 0 && c < facts.memory ? c : facts.memory;
  const mib = Math.floor((memory * HEAP_SHARE) / 2 ** 20);
  return mib > (facts.limit / 2 ** 20) * 1.25 ? mib : null;
}
