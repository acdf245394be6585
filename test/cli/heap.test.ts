/**
 * The heap limit the command starts with (`src/cli/heap.ts`): a larger one than Node's default
 * when the machine has the memory and nobody chose a limit. The relaunch itself runs in every
 * CLI test on a machine with more than about 6 GB (they start `dist/cli/bin.js`); the signal
 * tests of cli.test.ts send their signal to the first process.
 */
import { describe, expect, it } from 'vitest';
import { HEAP_ENV, heapLimitToAsk } from '../../src/cli/heap.js';

const GiB = 2 ** 30;
const base = { limit: 4 * GiB, memory: 24 * GiB, constrained: undefined, execArgv: [] as string[], env: {} as Record<string, string | undefined> };

describe('heapLimitToAsk', () => {
  it('asks for three quarters of the machine when that is well above the present limit', () => {
    expect(heapLimitToAsk(base)).toBe(18 * 1024);
    // A 7 GiB runner: 5.25 GiB, a quarter above 4 GiB and more. 6 GiB: 4.5 GiB is not.
    expect(heapLimitToAsk({ ...base, memory: 7 * GiB })).toBe(5376);
    expect(heapLimitToAsk({ ...base, memory: 6 * GiB })).toBeNull();
  });

  it("takes a container's limit when it is below the machine's memory", () => {
    expect(heapLimitToAsk({ ...base, constrained: 12 * GiB })).toBe(9 * 1024);
    expect(heapLimitToAsk({ ...base, constrained: 2 ** 64 })).toBe(18 * 1024);
    expect(heapLimitToAsk({ ...base, constrained: 0 })).toBe(18 * 1024);
  });

  it('leaves a limit someone chose, and does not start a child from a child', () => {
    expect(heapLimitToAsk({ ...base, execArgv: ['--max-old-space-size=2048'] })).toBeNull();
    expect(heapLimitToAsk({ ...base, env: { NODE_OPTIONS: '--enable-source-maps --max-old-space-size=9000' } })).toBeNull();
    expect(heapLimitToAsk({ ...base, env: { NODE_OPTIONS: '--max_old_space_size=9000' } })).toBeNull();
    expect(heapLimitToAsk({ ...base, env: { [HEAP_ENV]: '18432' } })).toBeNull();
    expect(heapLimitToAsk({ ...base, env: { [HEAP_ENV]: '0' } })).toBeNull();
    expect(heapLimitToAsk({ ...base, env: { NODE_OPTIONS: '--enable-source-maps' } })).toBe(18 * 1024);
  });
});
