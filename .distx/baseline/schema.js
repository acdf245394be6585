/** zod shapes of the findings and suggestions read back from JSON files (baselines, reports). */
import { z } from 'zod';
/** A finding as the report and the baseline file write it (`Finding` in types.ts). */
export const findingSchema = z.object({
    rule: z.string().min(1),
    severity: z.enum(['error', 'warning']),
    file: z.string(),
    line: z.number().int().min(1),
    column: z.number().int().min(1),
    route: z.string(),
    message: z.string(),
    target: z.string().optional(),
});
/** A suggestion as the report writes it (`Suggestion` in types.ts). */
export const suggestionSchema = z.object({
    id: z.string().min(1),
    source: z.string(),
    target: z.string().min(1),
    file: z.string().min(1),
    line: z.number().int().min(1),
    column: z.number().int().min(1),
    offset: z.number().int().min(-1),
    endOffset: z.number().int().min(-1),
    anchor: z.string().nullable(),
    similarity: z.number(),
    score: z.number(),
    targetRankBefore: z.number(),
    targetRankAfter: z.number().nullable(), // null: not computed (outside suggest.impactLimit)
    depthBefore: z.number().int().nullable(),
    depthAfter: z.number().int().nullable(),
    reason: z.string(),
    sourceHash: z.string(),
});
