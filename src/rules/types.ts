/**
 * Types of the rules stage: what a rule sees, what it returns, and how it describes itself.
 */
import type { z } from 'zod';
import type { ResolvedOptions } from '../config/options.js';
import type { PageFacts, Ranking, Severity, SiteGraph } from '../types.js';

/**
 * A warning about a file met while collecting the sources (a symlink leaving the root, an
 * unreadable file...). `collect`'s `CollectWarning` has this shape.
 */
export interface SourceWarning {
  readonly file: string;
  readonly code: string;
  readonly message: string;
}

/** A problem in an auxiliary file (redirects, traffic CSV) at a line. */
export interface AuxProblem {
  readonly file: string;
  readonly line: number;
  readonly message: string;
}

/** Everything a rule may look at. Plain data; rules never read files or configuration. */
export interface RuleContext {
  readonly graph: SiteGraph;
  /** Facts of every parsed file, in the order given to `buildGraph` (`PageNode.factsIndex` indexes it). */
  readonly facts: readonly PageFacts[];
  readonly ranking: Ranking;
  readonly options: ResolvedOptions;
  readonly warnings: readonly SourceWarning[];
  /** Problems in the navigation, redirects or traffic files. */
  readonly auxProblems?: readonly AuxProblem[];
}

/** What a rule reports: a place and a message. The engine adds the rule id and severity. */
export interface RuleFinding {
  /** Path relative to the content root; `''` when the finding belongs to no file (a missing entry page). */
  readonly file: string;
  /** 1-based; 1 when the finding has no natural position. */
  readonly line: number;
  readonly column: number;
  /** Route of the page concerned; `''` for files that are not pages. */
  readonly route: string;
  /**
   * A plain statement of what is wrong and what to do, one terminal line where possible:
   * "No page links to /guide/old/; link it from /guide/" (STYLE section 2.13).
   */
  readonly message: string;
  /** What the finding is about beyond its page (a link target, a fragment); baselines key on it. */
  readonly target?: string;
  /**
   * The finding's own severity, for rules whose findings differ in weight (`source-problem`).
   * Used only when the configuration does not set the check's level.
   */
  readonly severity?: Exclude<Severity, 'off'>;
}

/** A rule: metadata plus a pure check. */
export interface Rule<O extends object = object> {
  /** Kebab-case id, the key under `checks` in the configuration. */
  readonly id: string;
  /** One sentence: what the rule asks of the site. */
  readonly description: string;
  readonly defaultSeverity: Exclude<Severity, 'off'>;
  /** Options used when the configuration gives none; configured options are merged over them. */
  readonly defaultOptions: O;
  /** Validates the merged options (a strict object). Absent: the rule takes no options. */
  readonly optionsSchema?: z.ZodType<O>;
  /** Report findings. Never throws, prints or reads anything outside `ctx`. */
  check(ctx: RuleContext, options: O): RuleFinding[];
}
