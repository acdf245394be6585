import type { PageFacts } from '../types.js';
import type { ParseTask } from './types.js';
/** Parse every file of the batch with `parseSource` (which never throws). */
export default function parseBatch(task: ParseTask): PageFacts[];
