/**
 * Type test (compiled by `npm run typecheck`, not run): the documented `Config` interface of
 * src/config/config.ts is exactly the input type of the zod schema in src/config/options.ts. A key added to
 * the schema without its documented twin (or with another type) fails this file.
 */
import type { Config, SchemaInput } from '../../src/config/options.js';

/** True only when A and B are the same type (not merely assignable one way). */
type Equal<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
type Expect<T extends true> = T;

type Same = Expect<Equal<Config, SchemaInput>>;
type Keys = Expect<Equal<keyof Config, keyof SchemaInput>>;
type Routes = Expect<Equal<NonNullable<Config['routes']>, NonNullable<SchemaInput['routes']>>>;
type Suggest = Expect<Equal<NonNullable<Config['suggest']>, NonNullable<SchemaInput['suggest']>>>;
type Limits = Expect<Equal<NonNullable<Config['limits']>, NonNullable<SchemaInput['limits']>>>;
type Cache = Expect<Equal<NonNullable<Config['cache']>, NonNullable<SchemaInput['cache']>>>;
type Checks = Expect<Equal<NonNullable<Config['checks']>, NonNullable<SchemaInput['checks']>>>;
type Patterns = Expect<Equal<NonNullable<Config['linkPatterns']>, NonNullable<SchemaInput['linkPatterns']>>>;
type Whole = Expect<Equal<Required<{ [K in keyof Config]: NonNullable<Config[K]> }>, Required<{ [K in keyof SchemaInput]: NonNullable<SchemaInput[K]> }>>>;
type BothWays = Expect<Equal<[Config] extends [SchemaInput] ? ([SchemaInput] extends [Config] ? true : false) : false, true>>;

export type ConfigTypeChecks = [Same, Keys, Routes, Suggest, Limits, Cache, Checks, Patterns, Whole, BothWays];
