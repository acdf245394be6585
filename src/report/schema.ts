/**
 * The public JSON report contract (`linkweave/report@1`): what `--format json` writes and what
 * the Node API returns. Only types; changing a name or a shape here changes the contract.
 */

/** How important a page is: frontmatter `linkweave.importance`, `important` globs or traffic. */
export type Importance = 'high' | 'normal' | 'low';

/** Content links are written in the page's body; template links repeat on many pages. */
export type LinkContext = 'content' | 'template';

/** Classification of a link destination. */
export type LinkKind = 'internal' | 'external' | 'asset' | 'mailto' | 'other';

/** Outcome of resolving a link. */
export type LinkStatus =
  | 'ok'
  | 'broken'
  | 'broken-fragment'
  | 'external'
  | 'asset'
  | 'other'
  | 'self'
  /** A site link outside the content: above the base path, under a mounted or configured `outside` prefix. Never broken. */
  | 'outside'
  /** A destination holding template syntax (`{{`, `{%`, `<%`): never resolved, never broken. */
  | 'templated';

/** Rule severity as configured. `warn` and `warning` are accepted in config and mean the same. */
export type Severity = 'off' | 'warning' | 'error';

/** A finding of a rule, as the report carries it. */
export interface Finding {
  readonly rule: string;
  readonly severity: Exclude<Severity, 'off'>;
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly route: string;
  readonly message: string;
  /** What the finding is about, beyond its page (a link target, a fragment); used for baselines. */
  readonly target?: string;
}

/** Why a page wants more links. */
export type UnderlinkedReason = 'orphan' | 'unreachable' | 'too-deep' | 'few-inlinks' | 'rank-below-importance';

/** A proposed new link. */
export interface Suggestion {
  /** Stable id: hash of source route, target route and anchor. */
  readonly id: string;
  readonly source: string;
  readonly target: string;
  readonly file: string;
  readonly line: number;
  readonly column: number;
  /** UTF-16 offsets of the anchor phrase in the decoded source text; -1 when there is none. */
  readonly offset: number;
  readonly endOffset: number;
  /** The anchor phrase as it appears in the source, or null ("no anchor phrase"). */
  readonly anchor: string | null;
  readonly similarity: number;
  readonly score: number;
  readonly targetRankBefore: number;
  /** Target rank with the link added; null when not computed (outside `suggest.impactLimit`). */
  readonly targetRankAfter: number | null;
  readonly depthBefore: number | null;
  readonly depthAfter: number | null;
  readonly reason: string;
  /** Content hash of the source file the offsets refer to (`apply` refuses a changed file). */
  readonly sourceHash: string;
}

/**
 * The link model of a `suggest` run (`suggest/model.ts`): a logistic regression fitted on the
 * site's own content links, or fixed weights when the site has too few links to learn from.
 * `weights[i]` belongs to `features[i]` on the standardised scale ((x - means[i]) / scales[i]),
 * so their sizes compare: the larger a weight, the more that feature moves the score.
 */
export interface LinkModelReport {
  readonly source: 'fitted' | 'fixed';
  readonly features: readonly string[];
  readonly intercept: number;
  readonly weights: readonly number[];
  readonly means: readonly number[];
  readonly scales: readonly number[];
  /** Pairs the model was fitted on: existing content links, and candidate pairs without one. */
  readonly trainingPairs: { readonly linked: number; readonly notLinked: number };
  /** Pairs kept out of the fit (one in five, by a hash of the pair) to measure the AUC. */
  readonly heldOutPairs: { readonly linked: number; readonly notLinked: number };
  /** Area under the ROC curve on the held-out pairs; null when either kind is missing. */
  readonly auc: number | null;
  readonly iterations: number;
  readonly converged: boolean;
  /**
   * Which of a pair's mentions becomes the anchor: a second logistic regression, fitted on the
   * site's content links against the mentions of the same page their authors left unlinked.
   * Null when the site has too few such pairs (then the fixed order: the phrase's link odds
   * times its placement's, then the kind of name, the longer phrase, the earlier place).
   */
  readonly anchorChoice: AnchorChoiceReport | null;
}

/** The fitted anchor choice of {@link LinkModelReport}, on the same standardised scale. */
export interface AnchorChoiceReport {
  readonly features: readonly string[];
  readonly intercept: number;
  readonly weights: readonly number[];
  readonly means: readonly number[];
  readonly scales: readonly number[];
  /** Linked pairs fitted on (each with a mention its author passed over), and their anchor options. */
  readonly linkedPairs: number;
  readonly options: number;
}

/** One page row of the report. */
export interface ReportPage {
  readonly route: string;
  readonly file: string;
  readonly title: string;
  readonly pagerank: number;
  /** pagerank x number of pages: 1.0 is an average page. */
  readonly rank: number;
  /** Click depth from the entry pages, null when unreachable. */
  readonly depth: number | null;
  readonly inlinks: number;
  readonly contentInlinks: number;
  readonly outlinks: number;
  readonly importance: Importance;
}

/** One link row of the report. */
export interface ReportLink {
  readonly from: string;
  /** Resolved target: a route, an absolute URL, or the destination as written when unresolvable. */
  readonly to: string;
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly text: string;
  readonly context: LinkContext;
  readonly kind: LinkKind;
  readonly status: LinkStatus;
  readonly nofollow: boolean;
}

/** A gate limit that was crossed. */
export interface GateFailure {
  readonly rule: string;
  readonly limit: number;
  readonly actual: number;
}

/** The report (DESIGN section 8): the product's API. */
export interface Report {
  readonly schema: 'linkweave/report@1';
  readonly tool: { readonly name: 'linkweave'; readonly version: string };
  readonly root: string;
  readonly stats: {
    readonly files: number;
    readonly pages: number;
    readonly links: number;
    readonly internalLinks: number;
    readonly brokenLinks: number;
    readonly brokenFragments: number;
    /** Links to the site outside these sources (above the base path, mounted or `outside` prefixes): never broken. */
    readonly outsideLinks: number;
    /** Links whose destination holds template syntax: never resolved, never broken. */
    readonly templatedLinks: number;
    /** Includes whose file is not among the sources (once per path). */
    readonly includesOutside: number;
    readonly orphans: number;
    readonly unreachable: number;
    readonly deadEnds: number;
    readonly maxDepth: number | null;
    readonly iterations: number;
    readonly converged: boolean;
    readonly findings: { readonly error: number; readonly warning: number };
    /** The heading-id style fragments were checked under (`auto`: the one that resolves the most fragment links). */
    readonly headingIds: { readonly style: string; readonly how: 'auto' | 'set'; readonly fragmentLinks: number; readonly resolved: number };
  };
  readonly pages: readonly ReportPage[];
  readonly links: readonly ReportLink[];
  readonly findings: readonly Finding[];
  readonly suggestions: readonly Suggestion[];
  readonly gate: { readonly passed: boolean; readonly failOn: 'error' | 'warning'; readonly failures: readonly GateFailure[] };
  /** The configured limits the report's numbers are read against (the HTML report marks them). */
  readonly options: {
    /** Deepest click depth allowed (`ResolvedOptions.maxDepth`). */
    readonly maxDepth: number;
  };
  /** This run's findings against a baseline file (`--baseline`); the gate counted only `new`. */
  readonly baseline?: BaselineResult;
  /**
   * The depth-repair plan of `suggest`: the fewest suggestions (chosen greedily) that bring the
   * most too-deep or unreachable pages within `maxDepth`. Absent for `check`.
   */
  readonly repair?: RepairPlan;
  /** The link model that scored the suggestions (`suggest` only): what this site's linking habits are. */
  readonly model?: LinkModelReport;
  /** This run against a base report (`--compare BASE.json`): what a change did to the site. */
  readonly comparison?: Comparison;
}

/**
 * Findings matched against a baseline by rule, route and target (not line or message), with
 * multiplicity. Severity failures of the gate count `new` only; the gate's numeric limits
 * (`gate.maxDepth`, `gate.maxBrokenLinks`, ...) read the whole site.
 */
export interface BaselineResult {
  /** Findings of this run that the baseline accepts. */
  readonly known: number;
  /** Findings of this run not in the baseline, sorted as `Report.findings`. */
  readonly new: readonly Finding[];
  /** Baseline findings this run no longer has, as the baseline recorded them. */
  readonly fixed: readonly Finding[];
}

/** A page whose rank or click depth differs between two runs. */
export interface PageChange {
  readonly route: string;
  readonly file: string;
  /** Rank (pagerank x pages: 1.0 is an average page) in the base run and in this run. */
  readonly rankBefore: number;
  readonly rankAfter: number;
  /** rankAfter - rankBefore. */
  readonly rankChange: number;
  /** Click depth in the base run and in this run; null = unreachable. */
  readonly depthBefore: number | null;
  readonly depthAfter: number | null;
  /** depthAfter - depthBefore; 0 when equal (both unreachable too); null when the page became reachable or unreachable. */
  readonly depthChange: number | null;
}

/** Two runs compared (`--compare`): findings matched as for a baseline, pages by route. */
export interface Comparison {
  /** The base run: tool version and counts. */
  readonly base: { readonly version: string; readonly pages: number; readonly findings: number };
  /** Findings of this run the base did not have. */
  readonly newFindings: readonly Finding[];
  /** Findings of the base this run no longer has. */
  readonly fixedFindings: readonly Finding[];
  /** Findings both runs have. */
  readonly knownFindings: number;
  /** Pages only this run has / only the base had, by route. */
  readonly pagesAdded: readonly { readonly route: string; readonly file: string }[];
  readonly pagesRemoved: readonly { readonly route: string; readonly file: string }[];
  /** Pages in both runs whose rank changed most (top 10 by absolute change, then route). */
  readonly rankChanges: readonly PageChange[];
  /** Pages in both runs whose click depth changed most (top 10; reachability changes first). */
  readonly depthChanges: readonly PageChange[];
  /** How many pages changed rank (by at least 0.005) and depth in all (the lists show 10 at most). */
  readonly changedPages: { readonly rank: number; readonly depth: number };
}

/** A set of suggestions that together fix click-depth findings. */
export interface RepairPlan {
  readonly maxDepth: number;
  /** Pages (not excluded) deeper than `maxDepth` or unreachable, before. */
  readonly tooDeepBefore: number;
  /** The same count with every suggestion of the plan added. */
  readonly tooDeepAfter: number;
  /** Ids of the chosen suggestions, in the order the greedy pass chose them. */
  readonly suggestionIds: readonly string[];
}
