// The tables of bench/QUALITY.md from backtest JSON reports.
//
//   node bench/quality-table.mjs <name>=<report.json> ...
//
// Each report comes from `linkweave backtest <site> --runs 5 --keep-link-text --format json`.
// Prints, per set, the methods' mean ± sd of R@1, R@5, R@10, MRR and line match, the ratios the
// suggestion-model issue sets as targets, and one table of all sets against the targets.
import fs from 'node:fs';

const TARGETS = { r10: 1.25, r1: 1.5, line: 0.8 };
const f3 = (x) => (x === null || x === undefined ? '-' : x.toFixed(3));
const cell = (s) => (s.mean === null ? '-' : `${f3(s.mean)} ± ${f3(s.sd)}`);
const mean = (xs) => xs.reduce((a, x) => a + x, 0) / xs.length;

const rows = [];
for (const arg of process.argv.slice(2)) {
  const at = arg.indexOf('=');
  const name = arg.slice(0, at);
  const report = JSON.parse(fs.readFileSync(arg.slice(at + 1), 'utf8'));
  const by = Object.fromEntries(report.summary.map((s) => [s.method, s]));
  const ours = by.linkweave;
  const baselines = ['tfidf', 'title-phrase', 'random'].filter((m) => by[m] !== undefined);
  const best = baselines.reduce((b, m) => (by[m].recallAt10.mean > by[b].recallAt10.mean ? m : b));
  const r10 = ours.recallAt10.mean / by[best].recallAt10.mean;
  const r1 = ours.recallAt1.mean / by['title-phrase'].recallAt1.mean;
  const line = ours.lineMatch.mean;
  const ceiling = mean(report.runs.map((r) => r.bestRecallAt1).filter((x) => typeof x === 'number'));
  const auc = mean(report.runs.map((r) => r.model.auc).filter((x) => typeof x === 'number'));
  console.log(`### ${name} (${report.site.pages} pages, ${report.site.contentPairs} linked page pairs)\n`);
  console.log('| method | R@1 | R@5 | R@10 | MRR | line match |');
  console.log('|---|---:|---:|---:|---:|---:|');
  for (const s of report.summary) {
    console.log(`| ${s.method} | ${cell(s.recallAt1)} | ${cell(s.recallAt5)} | ${cell(s.recallAt10)} | ${cell(s.mrr)} | ${cell(s.lineMatch)} |`);
  }
  console.log(
    `\nR@10 / best baseline (${best}): **${r10.toFixed(2)}x** (target ${TARGETS.r10}x); R@1 / title phrase: **${r1.toFixed(2)}x** (target ${TARGETS.r1}x); ` +
      `line match **${(100 * line).toFixed(1)}%** (target ${100 * TARGETS.line}%); model AUC on kept-out training pairs ${auc.toFixed(3)}. ` +
      `Highest R@1 any method can reach (one first place per target): ${ceiling.toFixed(3)}, so the R@1 target is ${(TARGETS.r1 * by['title-phrase'].recallAt1.mean).toFixed(3)}` +
      ` = ${((100 * TARGETS.r1 * by['title-phrase'].recallAt1.mean) / ceiling).toFixed(0)}% of it.\n`,
  );
  rows.push({ name, r10, r1, line });
}
const met = (ok) => (ok ? 'met' : 'missed');
console.log('| set | R@10 / best baseline (target 1.25x) | R@1 / title phrase (target 1.5x) | line match (target 80%) |');
console.log('|---|---:|---:|---:|');
for (const r of rows) {
  console.log(`| ${r.name} | ${r.r10.toFixed(2)}x ${met(r.r10 >= TARGETS.r10)} | ${r.r1.toFixed(2)}x ${met(r.r1 >= TARGETS.r1)} | ${(100 * r.line).toFixed(1)}% ${met(r.line >= TARGETS.line)} |`);
}
