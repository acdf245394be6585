/** Types of the backtest: held-out links, per-method scores, one run, the whole result. */

/** What the backtest command was asked to do (checked by `parseBacktestFlags`). */
export interface BacktestSettings {
  /** Share of the eligible (source, target) content-link pairs to hold out, in (0, 0.9]. */
  readonly holdout: number;
  /** Seed of the first run; run i uses `seed + i`. */
  readonly seed: number;
  /** Number of runs (seeds), 1..50. */
  readonly runs: number;
  /**
   * Keep the text of a held-out link in its page as plain prose, where an anchor may be
   * proposed (the author's words without the link). Off: the words go with the link (out of
   * the page's text for TF-IDF, and never a place for an anchor).
   */
  readonly keepLinkText: boolean;
}

/** One content link that was held out, as the author wrote it. */
export interface HeldOutLink {
  readonly line: number;
  readonly column: number;
  /** The link text as written (the ground truth for anchor overlap). */
  readonly text: string;
  /** UTF-16 offsets of the link text in the source file, or -1 when it could not be located. */
  readonly offset: number;
  readonly endOffset: number;
  /**
   * 1-based line where the link's text starts (an HTML link's text may stand on the line after
   * its `<a` tag); `line` when the text could not be located.
   */
  readonly textLine: number;
}

/** A held-out (source, target) pair: every content link of the pair was removed. */
export interface HeldOutPair {
  /** Page ids (graph order: sorted by route). */
  readonly source: number;
  readonly target: number;
  readonly links: readonly HeldOutLink[];
}

/** The methods compared. */
export type MethodId = 'linkweave' | 'tfidf' | 'title-phrase' | 'random' | 'random-page';

/** The metrics of one method in one run (means over the scored target pages). */
export interface MethodScores {
  readonly method: MethodId;
  /** Recall at k = 1, 5, 10. */
  readonly recall: readonly [number, number, number];
  /** Precision at k = 1, 5, 10. */
  readonly precision: readonly [number, number, number];
  /** Mean reciprocal rank of the first held-out source within the top 10. */
  readonly mrr: number;
  /** Held-out pairs found in the top 10 of their target. */
  readonly recovered: number;
  /**
   * Share of recovered pairs whose suggested anchor shares a word stem with the original link
   * text; null for the baselines (they propose no anchor) or when nothing was recovered.
   */
  readonly anchorOverlap: number | null;
  /**
   * Share of recovered pairs whose suggested anchor lies on the original link text (the place
   * the author linked); null as for `anchorOverlap`, and without `keepLinkText` (the place is
   * then not available).
   */
  readonly anchorInPlace: number | null;
  /**
   * Line match: share of recovered pairs whose proposed anchor is on a line where one of the
   * pair's held-out links was (a pair without an anchor does not match); null for methods
   * without anchors or when nothing was recovered.
   */
  readonly lineMatch: number | null;
}

/** One run (one seed). */
export interface RunResult {
  readonly seed: number;
  readonly heldOutPairs: number;
  readonly heldOutLinks: number;
  /** Target pages with at least one held-out inlink: the pages scored. */
  readonly targets: number;
  /**
   * Share of the held-out pairs whose source is among its target's candidate sources (related
   * pages with similarity >= minSimilarity): the most any of the methods can find. Null when
   * nothing was held out.
   */
  readonly candidateCoverage: number | null;
  /**
   * The highest recall@1 any method can reach on this run: the mean over targets of
   * 1 / (held-out sources of the target), as one first place finds one of them. Null when nothing
   * was held out.
   */
  readonly bestRecallAt1: number | null;
  /** The link model fitted on this run's reduced site (source, training pairs, AUC). */
  readonly model: { readonly source: 'fitted' | 'fixed'; readonly trainingPairs: number; readonly auc: number | null };
  readonly methods: readonly MethodScores[];
}

/** A metric over the runs. `sd` is the sample standard deviation (n - 1), 0 for one run. */
export interface Spread {
  readonly mean: number | null;
  readonly sd: number | null;
}

/** A method's metrics over all runs. */
export interface MethodSummary {
  readonly method: MethodId;
  readonly recall: readonly [Spread, Spread, Spread];
  readonly precision: readonly [Spread, Spread, Spread];
  readonly mrr: Spread;
  readonly anchorOverlap: Spread;
  readonly anchorInPlace: Spread;
  readonly lineMatch: Spread;
}

/** The suggestion settings the backtest ran with, as configured and as used. */
export interface SuggestSettingsUsed {
  readonly minSimilarity: number;
  readonly relatedK: number;
  readonly perTarget: { readonly configured: number; readonly used: number };
  readonly perSource: { readonly configured: number; readonly used: number };
  readonly targets: { readonly configured: 'underlinked' | 'all'; readonly used: 'all' };
}

/** Everything the backtest measured. */
export interface BacktestResult {
  readonly root: string;
  readonly settings: BacktestSettings & { readonly seeds: readonly number[] };
  readonly suggest: SuggestSettingsUsed;
  readonly site: {
    readonly pages: number;
    /** Content links between two different pages. */
    readonly contentLinks: number;
    /** Distinct (source, target) pairs of those links. */
    readonly contentPairs: number;
    /** Pairs that may be held out (neither page excluded by `linkweave.exclude`). */
    readonly eligiblePairs: number;
  };
  readonly runs: readonly RunResult[];
  readonly summary: readonly MethodSummary[];
}
