/**
 * The prepare stage: the configuration resolved into options, the site generator's config read
 * (`preset`) and merged under the user's keys, the checks' settings validated. Every command
 * (check, suggest, apply, backtest, the plugins) starts here, once per run.
 */
import { resolve } from 'node:path';
import { resolveOptions } from '../config/options.js';
import type { Config } from '../config/options.js';
import { configWithPreset, readPreset } from '../preset/index.js';
import { validateRuleConfig } from '../rules/index.js';
import type { AnalyzeHooks, AnalyzeInput, PreparedRun } from './types.js';

/**
 * Prepare a run. The configuration is checked as written first, so a bad key is reported
 * against it; with a generator preset, the merged configuration is resolved against the
 * preset's content folder. The preset's summary goes to `hooks.onNote`.
 * @throws EngineError `E_CONFIG_INVALID` naming the key
 */
export function prepare(input: AnalyzeInput, hooks: Pick<AnalyzeHooks, 'onNote'> = {}): PreparedRun {
  const { root, command = 'check', configOrigin = 'configuration', baseline, ...rest } = input;
  const config: Config = rest;
  const written = resolveOptions(config, resolve(root), configOrigin);
  const preset = readPreset(resolve(root), written.preset);
  if (preset !== null) hooks.onNote?.(preset.summary);
  const options = preset === null ? written : resolveOptions(configWithPreset(preset, config), preset.contentRoot, configOrigin);
  const rules = validateRuleConfig(options, configOrigin);
  return { options, preset, command, configOrigin, rules, ...(baseline === undefined ? {} : { baseline }) };
}
