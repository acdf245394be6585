/** zod shapes of the findings and suggestions read back from JSON files (baselines, reports). */
import { z } from 'zod';
/** A finding as the report and the baseline file write it (`Finding` in types.ts). */
export declare const findingSchema: z.ZodObject<{
    rule: z.ZodString;
    severity: z.ZodEnum<{
        error: "error";
        warning: "warning";
    }>;
    file: z.ZodString;
    line: z.ZodNumber;
    column: z.ZodNumber;
    route: z.ZodString;
    message: z.ZodString;
    target: z.ZodOptional<z.ZodString>;
}, z.core.$strip>;
/** A suggestion as the report writes it (`Suggestion` in types.ts). */
export declare const suggestionSchema: z.ZodObject<{
    id: z.ZodString;
    source: z.ZodString;
    target: z.ZodString;
    file: z.ZodString;
    line: z.ZodNumber;
    column: z.ZodNumber;
    offset: z.ZodNumber;
    endOffset: z.ZodNumber;
    anchor: z.ZodNullable<z.ZodString>;
    similarity: z.ZodNumber;
    score: z.ZodNumber;
    targetRankBefore: z.ZodNumber;
    targetRankAfter: z.ZodNullable<z.ZodNumber>;
    depthBefore: z.ZodNullable<z.ZodNumber>;
    depthAfter: z.ZodNullable<z.ZodNumber>;
    reason: z.ZodString;
    sourceHash: z.ZodString;
}, z.core.$strip>;
