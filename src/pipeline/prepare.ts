/**
 * The prepare stage: the configuration resolved into options, the site generator's config read
 * (`preset`) and merged under the user's keys, the checks' settings validated. Every command
 * (check, suggest, apply, backtest, the plugins) starts here, once per run.
 */
import { resolve } from 'node:path';
import { resolveOptions } from '../config/options.js';
import type { Config, ResolvedOptions } from '../config/options.js';
import { configWithPreset, readPreset } from '../preset/index.js';
import { validateRuleConfig } from '../rules/index.js';
import type { AnalyzeHooks, AnalyzeInput, PreparedRun } from './types.js';

/** What a run is, besides its configuration. */
export interface RunSettings {
  /** Content root (absolute, or relative to the working folder). */
  readonly root: string;
  readonly command?: PreparedRun['command'];
  /** Where the configuration came from, named in error messages. @default 'configuration' */
  readonly configOrigin?: string;
  readonly baseline?: PreparedRun['baseline'];
}

/**
 * Settings that win over the configuration and the preset, applied to the resolved options
 * (the command line's flags, already checked by the flag parser).
 */
export type OptionsOverride = (options: ResolvedOptions) => ResolvedOptions;

/** Prepare a run of `analyze`'s input (configuration keys plus root, command, origin, baseline). */
export function prepare(input: AnalyzeInput, hooks: Pick<AnalyzeHooks, 'onNote'> = {}): PreparedRun {
  const { root, command, configOrigin, baseline, ...config } = input;
  return prepareConfig(config, { root, ...(command === undefined ? {} : { command }), ...(configOrigin === undefined ? {} : { configOrigin }), ...(baseline === undefined ? {} : { baseline }) }, hooks);
}

/**
 * Prepare a run. The configuration is resolved as written (a bad key is reported against it,
 * whatever `override` would set); with a generator preset, the preset's fragment goes under it
 * and the merged configuration is resolved against the preset's content folder. The preset's
 * summary goes to `hooks.onNote`. The checks' settings are validated once, here.
 * @param config the configuration as written (any value: it is validated here)
 * @throws EngineError `E_CONFIG_INVALID` naming the key
 */
export function prepareConfig(config: unknown, settings: RunSettings, hooks: Pick<AnalyzeHooks, 'onNote'> = {}, override: OptionsOverride = (o) => o): PreparedRun {
  const { root, command = 'check', configOrigin = 'configuration', baseline } = settings;
  const written = override(resolveOptions(config, resolve(root), configOrigin));
  const preset = readPreset(resolve(root), written.preset);
  if (preset !== null) hooks.onNote?.(preset.summary);
  const options = preset === null ? written : override(resolveOptions(configWithPreset(preset, config as Config), preset.contentRoot, configOrigin));
  const rules = validateRuleConfig(options, configOrigin);
  const routes = typeof config === 'object' && config !== null ? (config as Config).routes : undefined;
  const routeStyleGiven = preset !== null || options.routes.style !== 'directory' || (typeof routes === 'object' && routes !== null && routes.style !== undefined);
  return { options, preset, routeStyleGiven, command, configOrigin, rules, ...(baseline === undefined ? {} : { baseline }) };
}
