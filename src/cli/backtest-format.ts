/**
 * The backtest's outputs: a table for people and JSON for machines (`linkweave/backtest@1`).
 * Both print the settings the numbers depend on (share held out, seeds, minSimilarity, the
 * score formula and its factors, k, what the backtest changed), so runs with different
 * settings can be compared. Pure; numbers in the JSON are rounded to 6 decimals so the same
 * input gives byte-identical output.
 */
import { roundTo } from '../report/round.js';
import { VERSION } from '../version.js';
import { K_VALUES, LIST_LENGTH } from '../backtest/index.js';
import type { BacktestResult, MethodId, MethodScores, Spread } from '../backtest/index.js';

/** Schema id of the JSON output. */
export const BACKTEST_SCHEMA = 'linkweave/backtest@1';

const DECIMALS = 6;

/** How the methods are named in the table; a method without a label is shown by its id. */
export const METHOD_LABELS: Readonly<Partial<Record<MethodId, string>>> = {
  linkweave: 'linkweave',
  tfidf: 'TF-IDF only',
  'title-phrase': 'title phrase',
  random: 'random related',
  'random-page': 'random page',
};

/** The suggestion score as the suggestion stage computes it, in words. */
export function scoreFormula(_minSimilarity: number) {
  return {
    formula: "the link model's probability, refitted on each run's remaining links",
  };
}

const r = (x: number | null): number | null => (x === null ? null : roundTo(x, DECIMALS));
const rs = (s: Spread) => ({ mean: r(s.mean), sd: r(s.sd) });

function methodJson(m: MethodScores) {
  return {
    method: m.method,
    ...Object.fromEntries(K_VALUES.map((k, i) => [`recallAt${k}`, r(m.recall[i])])),
    ...Object.fromEntries(K_VALUES.map((k, i) => [`precisionAt${k}`, r(m.precision[i])])),
    mrr: r(m.mrr),
    recovered: m.recovered,
    anchorOverlap: r(m.anchorOverlap),
    anchorInPlace: r(m.anchorInPlace),
    lineMatch: r(m.lineMatch),
  };
}

/** The JSON output, indented, ending in a newline. */
export function formatBacktestJson(result: BacktestResult): string {
  const { settings, suggest } = result;
  const doc = {
    schema: BACKTEST_SCHEMA,
    tool: { name: 'linkweave', version: VERSION },
    root: result.root,
    settings: {
      holdout: settings.holdout,
      seeds: settings.seeds,
      runs: settings.runs,
      keepLinkText: settings.keepLinkText,
      k: [...K_VALUES],
      listLength: LIST_LENGTH,
      minSimilarity: suggest.minSimilarity,
      relatedK: suggest.relatedK,
      targets: suggest.targets,
      perTarget: suggest.perTarget,
      perSource: suggest.perSource,
      score: scoreFormula(suggest.minSimilarity),
    },
    site: result.site,
    runs: result.runs.map((run) => ({ ...run, candidateCoverage: r(run.candidateCoverage), bestRecallAt1: r(run.bestRecallAt1), methods: run.methods.map(methodJson) })),
    summary: result.summary.map((s) => ({
      method: s.method,
      ...Object.fromEntries(K_VALUES.map((k, i) => [`recallAt${k}`, rs(s.recall[i])])),
      ...Object.fromEntries(K_VALUES.map((k, i) => [`precisionAt${k}`, rs(s.precision[i])])),
      mrr: rs(s.mrr),
      anchorOverlap: rs(s.anchorOverlap),
      anchorInPlace: rs(s.anchorInPlace),
      lineMatch: rs(s.lineMatch),
    })),
  };
  return `${JSON.stringify(doc, null, 2)}\n`;
}

const f3 = (x: number): string => x.toFixed(3);

function cell(s: Spread, runs: number): string {
  if (s.mean === null) return '-';
  return runs > 1 && s.sd !== null ? `${f3(s.mean)}±${f3(s.sd)}` : f3(s.mean);
}

const mean = (xs: readonly number[]): number => (xs.length === 0 ? 0 : xs.reduce((a, b) => a + b, 0) / xs.length);
const count = (x: number): string => (Number.isInteger(x) ? String(x) : x.toFixed(1));

function coverage(runs: BacktestResult['runs']): string {
  const xs = runs.map((x) => x.candidateCoverage).filter((x): x is number => x !== null);
  return xs.length === 0 ? '-' : `${(100 * mean(xs)).toFixed(1)}%`;
}

/** A method's name for people. */
function methodLabel(method: MethodId): string {
  return METHOD_LABELS[method] ?? method;
}

function modelLine(runs: BacktestResult['runs']): string {
  const fitted = runs.filter((x) => x.model.source === 'fitted').length;
  const aucs = runs.map((x) => x.model.auc).filter((x): x is number => x !== null);
  const pairs = count(mean(runs.map((x) => x.model.trainingPairs)));
  const auc = aucs.length === 0 ? '' : `; AUC ${f3(mean(aucs))} on training pairs kept out of the fit`;
  const how = fitted === runs.length ? 'fitted in every run' : `fitted in ${fitted} of ${runs.length} runs, fixed weights in the rest (too few links)`;
  return `${how}, on ${pairs} pairs of pages per run${auc}`;
}

const pct = (x: number): string => `${(100 * x).toFixed(1)}%`;

/**
 * One sentence: linkweave's recall at k = 5 (the middle k) against the best baseline's, in
 * percentage points; every other method in the result is a baseline.
 */
function verdict(result: BacktestResult): string {
  const k = K_VALUES.length > 1 ? 1 : 0;
  const ours = result.summary.find((s) => s.method === 'linkweave');
  const baselines = result.summary.filter((s) => s.method !== 'linkweave' && s.recall[k].mean !== null);
  if (ours === undefined || ours.recall[k].mean === null || baselines.length === 0) return 'Verdict: nothing to compare.';
  const best = baselines.reduce((a, b) => (b.recall[k].mean! > a.recall[k].mean! ? b : a));
  const mine = ours.recall[k].mean!;
  const theirs = best.recall[k].mean!;
  const points = Math.abs(100 * (mine - theirs));
  const standing = points < 0.05 ? 'level with it' : `${points.toFixed(1)} points ${mine > theirs ? 'ahead' : 'behind'}`;
  const over = result.settings.runs > 1 ? ` (means over ${result.settings.runs} runs)` : '';
  return (
    `Verdict: linkweave finds ${pct(mine)} of the held-out links among its first ${K_VALUES[k]} proposed sources; ` +
    `the best baseline, ${methodLabel(best.method)}, finds ${pct(theirs)}: linkweave is ${standing}${over}.`
  );
}

/** Lay out `text` in lines of at most `width` columns after a label column (`indent` wide). */
function field(label: string, text: string, width = 100, indent = 16): string[] {
  const lines: string[] = [];
  let line = indent === 0 ? '' : `  ${label.padEnd(indent - 2)}`;
  let empty = true;
  for (const word of text.split(' ')) {
    if (!empty && line.length + 1 + word.length > width) {
      lines.push(line);
      line = ' '.repeat(indent);
      empty = true;
    }
    line += empty ? word : ` ${word}`;
    empty = false;
  }
  lines.push(line);
  return lines;
}

/** Plain words for a verdict line and a table, ending in a newline. */
export function formatBacktestText(result: BacktestResult): string {
  const { settings, suggest, site, runs } = result;
  const score = scoreFormula(suggest.minSimilarity);
  const seeds = settings.runs === 1 ? `seed ${settings.seed}` : `seeds ${settings.seeds[0]}..${settings.seeds[settings.seeds.length - 1]} (${settings.runs} runs)`;
  const perRun = (f: (x: BacktestResult['runs'][number]) => number) => count(mean(runs.map(f)));
  const perSource = suggest.perSource;
  const eligible = site.eligiblePairs === site.contentPairs ? 'all may be held out' : `${site.eligiblePairs} may be held out`;
  const pairs = site.contentLinks === site.contentPairs ? `${site.contentLinks} content links between pages` : `${site.contentLinks} content links between ${site.contentPairs} pairs of pages`;
  const forTest = [
    suggest.targets.configured === 'all' ? 'links proposed to every page' : 'links proposed to every page, not only the under-linked ones',
    `up to ${suggest.perTarget.used} per target page${suggest.perTarget.configured === suggest.perTarget.used ? '' : ` (configured: ${suggest.perTarget.configured})`}`,
    perSource.used === 0 ? `no cap per source page (configured: ${perSource.configured === 0 ? 'none' : perSource.configured})` : `up to ${perSource.used} per source page`,
  ];
  const tested = [
    ...field('site', `${site.pages} pages, ${pairs} (${eligible})`),
    ...field('held out', `${roundTo(settings.holdout * 100, 2)}% of them, ${seeds}: ${settings.runs > 1 ? 'per run ' : ''}${perRun((x) => x.heldOutLinks)} links from ${perRun((x) => x.heldOutPairs)} pairs into ${perRun((x) => x.targets)} target pages; every page keeps a content link in`),
    ...field('link words', settings.keepLinkText ? 'kept in the page as prose, where an anchor may go (--keep-link-text)' : 'removed with the link (--keep-link-text keeps them as prose)'),
    ...field('within reach', `${coverage(runs)} of the held-out sources are among linkweave's candidates for their target (pages that mention its names, its ${suggest.relatedK} most related pages, its graph neighbourhood)`),
    ...field('score', score.formula),
    ...field('model', modelLine(runs)),
    ...field('for the test', `${forTest.join('; ')}`),
  ];
  const lines = [`linkweave backtest: ${result.root}`, ''];
  if (result.summary.every((s) => s.mrr.mean === null)) {
    lines.push(
      'Nothing was held out: no page has content inlinks from two or more other pages, so any held-out',
      'link would leave a page without inlinks.',
      '',
      ...tested,
    );
    return `${lines.join('\n')}\n`;
  }
  lines.push(...field('', verdict(result), 100, 0), '');
  const header = ['method', ...K_VALUES.map((k) => `R@${k}`), ...K_VALUES.map((k) => `P@${k}`), 'MRR', 'anchor', 'line'];
  const rows = result.summary.map((s) => [
    methodLabel(s.method),
    ...s.recall.map((x) => cell(x, settings.runs)),
    ...s.precision.map((x) => cell(x, settings.runs)),
    cell(s.mrr, settings.runs),
    cell(s.anchorOverlap, settings.runs),
    cell(s.lineMatch, settings.runs),
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
  const line = (row: readonly string[]) => `  ${row.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ')}`.trimEnd();
  lines.push(line(header), ...rows.map(line), '');
  const ours = result.summary.find((s) => s.method === 'linkweave');
  const place = settings.keepLinkText && ours !== undefined ? ` On the original link's own place: ${cell(ours.anchorInPlace, settings.runs)}.` : '';
  lines.push(
    `  ${settings.runs > 1 ? 'Cells: mean±sample standard deviation over the runs. ' : ''}Means over the target pages with held-out inlinks.`,
    '  R@k: share of a target\'s held-out sources among its first k proposed sources. P@k: held-out',
    '  sources among the first k, divided by k. MRR: 1 / rank of the first held-out source in the',
    `  top ${LIST_LENGTH} (0 if none). anchor: share of the recovered links whose anchor shares a word stem`,
    `  with the original link text. line: share of the recovered links whose anchor is on the line of`,
    `  the original link.${place}`,
    '',
    'What was tested',
    ...tested,
  );
  return `${lines.join('\n')}\n`;
}
