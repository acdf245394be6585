import { describe, expect, it } from 'vitest';
import { AUTO_MAX_THREADS, AUTO_MIN_CORES, AUTO_MIN_FILES, chooseThreads, makeBatches } from '../../src/parallel/plan.js';
import type { SourceFile } from '../../src/types.js';

describe('chooseThreads', () => {
  it('follows an explicit setting (1 = main thread only)', () => {
    expect(chooseThreads(1, 100_000, 16)).toBe(1);
    expect(chooseThreads(3, 10, 2)).toBe(3);
  });

  it('automatic: main thread below the file threshold or on one or two cores, else a worker per core but one', () => {
    expect(AUTO_MIN_CORES).toBe(3);
    expect(chooseThreads(0, AUTO_MIN_FILES - 1, 8)).toBe(1);
    expect(chooseThreads(0, 1_000_000, 1)).toBe(1);
    expect(chooseThreads(0, 1_000_000, 2)).toBe(1);
    expect(chooseThreads(0, AUTO_MIN_FILES, 3)).toBe(2);
    expect(chooseThreads(0, AUTO_MIN_FILES, 4)).toBe(3);
    expect(chooseThreads(0, 1_000_000, 64)).toBe(AUTO_MAX_THREADS);
  });

  it('never starts workers for nothing', () => {
    expect(chooseThreads(4, 0, 8)).toBe(1);
  });
});

function files(sizes: readonly number[]): SourceFile[] {
  return sizes.map((n, i) => ({ path: `p${i}.md`, kind: 'markdown', bytes: n, hash: String(i), text: 'x'.repeat(n), problems: [] }));
}

describe('makeBatches', () => {
  it('covers every file once, in order, in consecutive runs', () => {
    const sizes = Array.from({ length: 3000 }, (_, i) => ((i * 7919) % 5000) + 10);
    for (const threads of [1, 2, 3, 8]) {
      const batches = makeBatches(files(sizes), threads);
      expect(batches[0]!.start).toBe(0);
      expect(batches.at(-1)!.end).toBe(sizes.length);
      for (let i = 1; i < batches.length; i++) expect(batches[i]!.start).toBe(batches[i - 1]!.end);
      for (const b of batches) expect(b.end).toBeGreaterThan(b.start);
      // About eight batches per thread (each closes once it reaches the target size).
      expect(batches.length).toBeGreaterThanOrEqual(threads * 7);
    }
  });

  it('caps files per batch and keeps one small site in few batches', () => {
    expect(makeBatches(files(new Array(1000).fill(1)), 2).every((b) => b.end - b.start <= 256)).toBe(true);
    expect(makeBatches(files([100, 100, 100]), 2)).toEqual([{ start: 0, end: 3 }]);
    expect(makeBatches([], 2)).toEqual([]);
  });
});
