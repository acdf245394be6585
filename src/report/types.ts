/** Types of the report stage: what `buildReport` takes and what formatters share. */
import type { ResolvedOptions } from '../config/options.js';
import type { LinkStyle } from '../routes/index.js';
import type { Finding, Importance, LinkModelReport, Ranking, RepairPlan, Report, SiteGraph, Suggestion } from '../types.js';


/** Everything `buildReport` needs; `analyze` passes the stages' outputs unchanged. */
export interface ReportInput {
  readonly options: ResolvedOptions;
  readonly graph: SiteGraph;
  readonly ranking: Ranking;
  /** From `runRules` (any order: the report sorts). */
  readonly findings: readonly Finding[];
  /** From `suggestLinks` (any order: the report sorts); `[]` for `check`. */
  readonly suggestions: readonly Suggestion[];
  /** Number of source files collected (pages, drafts, files that failed to parse). */
  readonly files: number;
  /**
   * Importance per page id, from `suggestLinks`. Absent: frontmatter `linkweave.importance`,
   * else `normal`.
   */
  readonly importance?: readonly Importance[];
  /** The tool's version (`VERSION`). */
  readonly version: string;
  /**
   * Findings accepted for now (`--baseline`): the gate's severity failures count only the
   * findings not in it; the report lists new and fixed ones in `Report.baseline`.
   */
  readonly baseline?: { readonly findings: readonly Finding[] };
  /** The depth-repair plan from `suggestLinks` (suggest only). */
  readonly repair?: RepairPlan;
  /** The link model from `suggestLinks` (suggest only). */
  readonly model?: LinkModelReport;
}

/** The counts the gate's limits read (from the report's stats, plus one the stats do not carry). */
export interface GateStats {
  /** Click depth of the deepest reachable page (the report's `stats.maxDepth`); null when none is reachable. */
  readonly deepest: number | null;
  readonly orphans: number;
  readonly brokenLinks: number;
  readonly brokenFragments: number;
  readonly unreachable: number;
  /** Fewest content inlinks of any page of high importance; `null` when no page is. */
  readonly fewestImportantInlinks: number | null;
}

/** Output formats. `html` is the stand-alone HTML report. */
export type FormatId = 'text' | 'json' | 'markdown' | 'sarif' | 'html';

/** What a formatter may know beyond the report. */
export interface FormatContext {
  /** Use terminal colours (text format only). @default false */
  readonly color: boolean;
  /**
   * The working folder: the text format shows file paths relative to it (so terminals and
   * editors can open them). Absent: paths relative to the content root, as in the report.
   */
  readonly cwd?: string;
  /** Terminal width for wrapping the text format; 0 = never wrap. @default 80 */
  readonly width?: number;
  /**
   * Text format: list at most this many findings and this many suggestions, then say how many
   * more there are (for the summary printed after another format was written to a file).
   * @default all
   */
  readonly maxItems?: number;
  /**
   * Words to add to the printed apply command so that it reads the same configuration as this
   * run, e.g. `['--config', 'ci/linkweave.json']` (as the user typed them). @default none
   */
  readonly applyArgs?: readonly string[];
  /**
   * SARIF: the link style of each source file (by its path in the report), so a fix proposes
   * the markup `apply` writes there (`ApplyResult.styles`; give `absolute` for an HTML page
   * with a `<base href>`). A file not in it gets `relative`. @default none
   */
  readonly linkStyles?: ReadonlyMap<string, LinkStyle>;
}

/** A report writer: pure, one file each under `report/formatters/`. */
export interface Formatter {
  readonly id: FormatId;
  /** File extension of its output, with the dot (`.json`). */
  readonly fileExtension: string;
  format(report: Report, ctx: FormatContext): string;
  /**
   * The same text in pieces to be written one after another, made as they are read, for outputs
   * that may outgrow one string (V8 strings hold at most 2^29 - 24 characters) or that should
   * not be held whole in memory. Absent: `format` is one piece.
   */
  pieces?(report: Report, ctx: FormatContext): Iterable<string>;
}
