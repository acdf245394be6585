/**
 * The collect stage: the sources under the root and the auxiliary files (navigation, redirects,
 * traffic), with what the generator preset adds (its navigation list and redirects).
 */
import { collectSources, readAuxFile } from '../collect/index.js';
import type { ResolvedOptions } from '../config/options.js';
import { parseNavigation, parseRedirects } from '../parse/index.js';
import type { Redirect } from '../parse/index.js';
import type { PresetRun } from '../preset/index.js';
import type { AuxProblem } from '../rules/index.js';
import { parseTraffic } from '../suggest/index.js';
import type { AnalyzeHooks, CollectedInputs, PreparedRun } from './types.js';
import { styleFromLinks } from '../routes/index.js';

/** Read everything the later stages read from disk: the sources, navigation, redirects and traffic files. */
export async function collectInputs(options: ResolvedOptions, preset: PresetRun | null = null): Promise<CollectedInputs> {
  const aux = [options.navigation, options.redirects, options.traffic].filter((p): p is string => p !== null);
  const [sources, navText, redirectsText, trafficText] = await Promise.all([
    collectSources(options, aux),
    options.navigation === null ? null : readAuxFile(options, 'navigation', options.navigation),
    options.redirects === null ? null : readAuxFile(options, 'redirects', options.redirects),
    options.traffic === null ? null : readAuxFile(options, 'traffic', options.traffic),
  ]);
  const auxProblems: AuxProblem[] = [];
  let navigation = navText === null ? null : { file: navText.file, links: parseNavigation(navText.file, navText.text) };
  const presetNav = preset?.site.navigation ?? null;
  if (navigation === null && presetNav !== null) {
    const name = presetNav.format === 'yaml' && !/\.ya?ml$/i.test(presetNav.file) ? `${presetNav.file}.yml` : presetNav.file;
    navigation = { file: presetNav.file, links: parseNavigation(name, presetNav.text) };
  }
  let redirects: Redirect[] = (preset?.site.redirects ?? []).map((r) => ({ from: r.from, to: r.to, line: 0 }));
  if (redirectsText !== null) {
    const parsed = parseRedirects(redirectsText.file, redirectsText.text);
    redirects = [...parsed.redirects, ...redirects];
    for (const p of parsed.problems) auxProblems.push({ file: redirectsText.file, line: p.line, message: p.message });
  }
  let traffic: Map<string, number> | null = null;
  if (trafficText !== null) {
    const parsed = parseTraffic(trafficText.file, trafficText.text);
    traffic = parsed.views;
    for (const p of parsed.problems) auxProblems.push({ file: trafficText.file, line: p.line, message: p.message });
  }
  return { sources, navigation, redirects, traffic, auxProblems };
}

/**
 * The collect stage of a prepared run. A navigation list read from the generator's config is
 * named in the returned run's options like a navigation file. With no route style given (no
 * configuration key, no preset), the style the site's links are written for is chosen
 * (`styleFromLinks`) and `hooks.onNote` says so.
 */
export async function collect(run: PreparedRun, hooks: Pick<AnalyzeHooks, 'onNote'> = {}): Promise<{ run: PreparedRun; collected: CollectedInputs }> {
  const collected = await collectInputs(run.options, run.preset);
  let options = run.options;
  if (options.navigation === null && collected.navigation !== null) options = { ...options, navigation: collected.navigation.file };
  if (!run.routeStyleGiven) {
    const read = styleFromLinks(collected.sources.files);
    if (read.style !== null) {
      options = { ...options, routes: { ...options.routes, style: read.style } };
      hooks.onNote?.(`routes: .html pages (chosen by the links: ${read.naming} of ${read.htmlLinks} relative .html links name a Markdown source); set routes.style to choose`);
    }
  }
  return { run: options === run.options ? run : { ...run, options }, collected };
}
