/**
 * The one place that holds defaults and validates configuration (STYLE section 2.5).
 * Every entry point (CLI, Node API, plugins) goes through `resolveOptions`; later code gets
 * `ResolvedOptions` with nothing optional.
 */
import { z } from 'zod';
declare const schema: z.ZodObject<{
    include: z.ZodDefault<z.ZodArray<z.ZodString>>;
    exclude: z.ZodDefault<z.ZodArray<z.ZodString>>;
    routes: z.ZodPrefault<z.ZodObject<{
        style: z.ZodDefault<z.ZodEnum<{
            directory: "directory";
            html: "html";
        }>>;
        basePath: z.ZodDefault<z.ZodString>;
        indexNames: z.ZodDefault<z.ZodArray<z.ZodString>>;
        caseInsensitive: z.ZodDefault<z.ZodBoolean>;
    }, z.core.$strict>>;
    entry: z.ZodDefault<z.ZodArray<z.ZodString>>;
    navigation: z.ZodDefault<z.ZodNullable<z.ZodString>>;
    redirects: z.ZodDefault<z.ZodNullable<z.ZodString>>;
    linkPatterns: z.ZodDefault<z.ZodArray<z.ZodObject<{
        pattern: z.ZodString;
        route: z.ZodString;
    }, z.core.$strict>>>;
    templateWeight: z.ZodDefault<z.ZodNumber>;
    templateShare: z.ZodDefault<z.ZodNumber>;
    depthCountsTemplate: z.ZodDefault<z.ZodBoolean>;
    teleport: z.ZodDefault<z.ZodEnum<{
        entry: "entry";
        uniform: "uniform";
    }>>;
    damping: z.ZodDefault<z.ZodNumber>;
    pagerankIterations: z.ZodDefault<z.ZodNumber>;
    pagerankTolerance: z.ZodDefault<z.ZodNumber>;
    maxDepth: z.ZodDefault<z.ZodNumber>;
    maxFileBytes: z.ZodDefault<z.ZodNumber>;
    maxLinksPerPage: z.ZodDefault<z.ZodNumber>;
    rules: z.ZodDefault<z.ZodRecord<z.ZodString, z.ZodUnion<readonly [z.ZodPipe<z.ZodEnum<{
        error: "error";
        off: "off";
        warn: "warn";
        warning: "warning";
    }>, z.ZodTransform<"error" | "off" | "warning", "error" | "off" | "warn" | "warning">>, z.ZodTuple<[z.ZodPipe<z.ZodEnum<{
        error: "error";
        off: "off";
        warn: "warn";
        warning: "warning";
    }>, z.ZodTransform<"error" | "off" | "warning", "error" | "off" | "warn" | "warning">>, z.ZodRecord<z.ZodString, z.ZodUnknown>], null>]>>>;
    failOn: z.ZodDefault<z.ZodEnum<{
        error: "error";
        warning: "warning";
    }>>;
    important: z.ZodDefault<z.ZodArray<z.ZodString>>;
    traffic: z.ZodDefault<z.ZodNullable<z.ZodString>>;
    suggest: z.ZodPrefault<z.ZodObject<{
        targets: z.ZodDefault<z.ZodEnum<{
            all: "all";
            underlinked: "underlinked";
        }>>;
        perTarget: z.ZodDefault<z.ZodNumber>;
        perSource: z.ZodDefault<z.ZodNumber>;
        minScore: z.ZodDefault<z.ZodNumber>;
        minSimilarity: z.ZodDefault<z.ZodNumber>;
        relatedK: z.ZodDefault<z.ZodNumber>;
        minInlinks: z.ZodDefault<z.ZodNumber>;
        rankGap: z.ZodDefault<z.ZodNumber>;
        impactLimit: z.ZodDefault<z.ZodNumber>;
    }, z.core.$strict>>;
    gate: z.ZodPrefault<z.ZodObject<{
        maxDepth: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        maxOrphans: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        maxBrokenLinks: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        maxBrokenFragments: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        maxUnreachable: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        maxWarnings: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
        minInlinksForImportant: z.ZodDefault<z.ZodNullable<z.ZodNumber>>;
    }, z.core.$strict>>;
    cache: z.ZodPrefault<z.ZodObject<{
        enabled: z.ZodDefault<z.ZodBoolean>;
        dir: z.ZodDefault<z.ZodString>;
    }, z.core.$strict>>;
    workers: z.ZodDefault<z.ZodNumber>;
}, z.core.$strict>;
/** Configuration as a user writes it (every key optional), documented key by key in src/config.ts. */
export type { Config } from './config.js';
/** The schema's input type; `test/types/config.test-d.ts` checks it equals `Config`. */
export type SchemaInput = z.input<typeof schema>;
/** Configuration after defaults and validation. */
export type ResolvedOptions = z.output<typeof schema> & {
    /** Absolute path of the content root. */
    readonly root: string;
};
/** The defaults, as a resolved object (root: the working folder). */
export declare const DEFAULT_OPTIONS: Omit<ResolvedOptions, 'root'>;
/**
 * Validate a user configuration and fill in defaults.
 * @param input configuration as written (from a file, the API or flags merged over a file)
 * @param root absolute path of the content root
 * @param origin where the configuration came from, named in error messages
 * @throws EngineError `E_CONFIG_INVALID` naming the key, the problem and the accepted values
 */
export declare function resolveOptions(input: unknown, root: string, origin?: string): ResolvedOptions;
