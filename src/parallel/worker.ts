/**
 * The worker thread's task (loaded by piscina from the built `dist/parallel/worker.js`): parse
 * one batch of files, results in the batch's order.
 */
import { parseSource } from '../parse/index.js';
import type { PageFacts } from '../types.js';
import type { ParseTask } from './types.js';

/** Parse every file of the batch with `parseSource` (which never throws). */
export default function parseBatch(task: ParseTask): PageFacts[] {
  const out: PageFacts[] = new Array(task.files.length);
  for (let i = 0; i < task.files.length; i++) out[i] = parseSource(task.files[i], task.options);
  return out;
}
