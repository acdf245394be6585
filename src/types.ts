/**
 * The plain data passed between the pipeline's stages (DESIGN section 2).
 *
 * collect -> SourceFile[] -> parse -> PageFacts[] -> graph -> SiteGraph
 *   -> rank -> Ranking -> text -> TermIndex/Related -> suggest -> Suggestion[]
 *   -> rules -> Finding[] -> report -> Report
 *
 * Everything here is readonly data. Typed arrays are used where a stage's hot loop needs them;
 * the report stage maps them back to JSON-friendly arrays.
 */

/** Kind of a source file, from its extension. */
export type FileKind = 'markdown' | 'html';

/** A file under the content root, as `collect` found it. */
export interface SourceFile {
  /** Path relative to the content root, with `/` separators (e.g. `guide/install.md`). */
  readonly path: string;
  readonly kind: FileKind;
  /** Size in bytes on disk. */
  readonly bytes: number;
  /** sha256 of the raw bytes, hex. */
  readonly hash: string;
  /**
   * Decoded text (UTF-8 with replacement, BOM removed). Empty when the file was skipped;
   * see `problems`.
   */
  readonly text: string;
  /** Problems met while reading (invalid UTF-8, too large, binary, unreadable). */
  readonly problems: readonly SourceProblem[];
}

/** Something wrong with one source file. Becomes a finding of the `source-problem` rule. */
export interface SourceProblem {
  readonly code:
    | 'invalid-utf8'
    | 'too-large'
    | 'binary'
    | 'unreadable'
    | 'frontmatter'
    | 'parse-failed'
    | 'bad-link-pattern'
    | 'too-many-links'
    | 'deep-nesting'
    /** A paragraph too long or too full of emphasis/bracket marks for the full parser; read with a simple scan. */
    | 'too-complex';
  readonly message: string;
  readonly line?: number;
  readonly column?: number;
}

/** Where a link came from. */
export type LinkOrigin = 'markdown' | 'html' | 'pattern' | 'navigation';

/** Content links are written in the page's body; template links repeat on many pages. */
export type LinkContext = 'content' | 'template';

/** A link as written in a page, before resolution. */
export interface RawLink {
  /** The destination exactly as written (for patterns: the route produced by the template). */
  readonly href: string;
  /** Visible link text (plain). */
  readonly text: string;
  /** 1-based line and column of the link's start in the source file. */
  readonly line: number;
  readonly column: number;
  readonly context: LinkContext;
  readonly nofollow: boolean;
  readonly origin: LinkOrigin;
  /** True when `href` names a source file (from a link pattern whose route ends in a source extension). */
  readonly fileRelative?: boolean;
  /**
   * The file the link is written in, when it is not the page's own: a file the page includes
   * (`line` and `column` are in that file). Set by the graph stage, never by the parse stage.
   */
  readonly file?: string;
}

/** A heading with its fragment slug. */
export interface Heading {
  readonly depth: number;
  readonly text: string;
  readonly slug: string;
  readonly line: number;
  readonly column: number;
  /** True when the id is written in the source (`## Title {#id}`): every heading-id style keeps it. */
  readonly explicit?: true;
  /** The text a heading-id style turns into the id, when it differs from `text` (runs of spaces kept). */
  readonly raw?: string;
}

/**
 * A run of source text in which a link may be inserted: plain prose outside existing links,
 * headings, code, images and HTML. `text` equals the source bytes between `offset` and
 * `offset + length(text)` exactly (UTF-16 offsets into the decoded text).
 */
export interface TextSpan {
  readonly text: string;
  /** UTF-16 offset into `SourceFile.text`. */
  readonly offset: number;
  readonly line: number;
  readonly column: number;
}

/**
 * An inline code span in prose (Markdown `` `name()` ``, outside links, headings and templates,
 * on one line): a place where a link may wrap the whole span, as API references link their code
 * names. `offset`/`endOffset` cover the span with its backticks, exactly one `code` protected
 * region; `apply` wraps it whole or not at all.
 */
export interface CodeSpan {
  /** The span as written, backticks included (the source between `offset` and `endOffset`). */
  readonly text: string;
  /** UTF-16 offsets into `SourceFile.text`, backticks included. */
  readonly offset: number;
  readonly endOffset: number;
  readonly line: number;
  readonly column: number;
}

/**
 * What a protected region of a source is: syntax a site generator reads, where a link inserted
 * by `apply` would change a name, an argument, a URL or hidden text instead of prose.
 * - `shortcode`: Hugo `{{< ... >}}` and `{{% ... %}}`;
 * - `template-tag`: `{{ ... }}` (Liquid, Nunjucks, Eleventy, VitePress/Vue interpolation, mdBook
 *   `{{#include ...}}`, macros such as `{{jsxref("Array")}}`), `{% ... %}` and `{# ... #}`;
 * - `template-block`: the body of a block that is not prose: Liquid/Nunjucks `raw`, `verbatim`,
 *   `comment`, `highlight`, Hugo's `highlight` shortcode, kramdown's `{::comment}` and
 *   `{::nomarkdown}`;
 * - `mdx-jsx`: a JSX element's tag in an `.mdx` file (its children are prose);
 * - `mdx-expression`: a `{...}` expression in an `.mdx` file;
 * - `braces`: any other `{...}` group outside code (expressions and type annotations some
 *   generators read, such as `{string}` in API docs);
 * - `html-tag`: an HTML tag with its attributes; `html-comment`: an HTML comment;
 * - `front-matter`: the YAML (`---`) or TOML (`+++`) block at the top;
 * - `link-definition`: a Markdown link reference definition (`[label]: /url "title"`);
 * - `container-marker`: an admonition or container line (`:::`, `!!!`, `???`);
 * - `attribute-list`: a heading id `{#id}` or an attribute list `{: .class}`, `{.class #id}`;
 * - `link`: an existing link, its text included (a link inside it would break it);
 * - `code`: inline code, code blocks, scripts and styles.
 */
export type ProtectedKind =
  | 'shortcode'
  | 'template-tag'
  | 'template-block'
  | 'mdx-jsx'
  | 'mdx-expression'
  | 'braces'
  | 'html-tag'
  | 'html-comment'
  | 'front-matter'
  | 'link-definition'
  | 'container-marker'
  | 'attribute-list'
  | 'link'
  | 'code';

/**
 * A protected region: UTF-16 offsets `[start, end)` into `SourceFile.text`, and its kind.
 * No link may be inserted overlapping it.
 */
export type ProtectedRegion = readonly [start: number, end: number, kind: ProtectedKind];

/** Text of a page for the term index, split by field (boosts differ). */
export interface PageText {
  readonly title: string;
  readonly headings: string;
  readonly body: string;
}

/** Frontmatter keys linkweave reads. */
export interface PageMeta {
  readonly slug?: string;
  readonly permalink?: string;
  /** Hugo's `url`: the page's whole path. */
  readonly url?: string;
  /** `date` as written (a generator's permalink patterns read it). */
  readonly date?: string;
  /** `categories` (or `category`), for Jekyll's `:categories`. */
  readonly categories?: readonly string[];
  readonly draft: boolean;
  readonly noindex: boolean;
  readonly aliases: readonly string[];
  /** `linkweave.importance` */
  readonly importance?: 'high' | 'normal' | 'low';
  /** `linkweave.exclude`: the page takes part in the graph but gets no findings or suggestions. */
  readonly exclude: boolean;
}

/** A file pulled into a page by the generator's include syntax. */
export interface IncludeRef {
  /** The path as written. */
  readonly written: string;
  /** The candidate paths relative to the content root, `/` separators, in lookup order (may start with `../`). */
  readonly paths: readonly string[];
  readonly line: number;
  readonly column: number;
}

/** Everything `parse` learns about one source file. */
export interface PageFacts {
  readonly file: string;
  readonly kind: FileKind;
  readonly hash: string;
  /** Route (URL path) of the page, e.g. `/guide/install/`. */
  readonly route: string;
  readonly title: string;
  readonly meta: PageMeta;
  readonly headings: readonly Heading[];
  /** Every fragment target in the page: heading slugs plus `id`/`name` attributes. Sorted, unique. */
  readonly ids: readonly string[];
  /**
   * The ids that do not depend on the heading-id style (`id`/`name` attributes, explicit heading
   * ids), sorted; present on Markdown pages with headings whose ids the style makes. Absent: every
   * id in `ids` is fixed.
   */
  readonly fixedIds?: readonly string[];
  /** Files this page pulls in (mdBook `{{#include}}`, MkDocs snippets, Hugo include shortcodes). */
  readonly includes?: readonly IncludeRef[];
  readonly links: readonly RawLink[];
  /** HTML `<base href>` (first with an href), if any. */
  readonly baseHref?: string;
  readonly text: PageText;
  readonly spans: readonly TextSpan[];
  /** Inline code spans a link may wrap whole (Markdown pages; absent when there are none). */
  readonly codeSpans?: readonly CodeSpan[];
  /**
   * Protected regions, sorted by start (ends ascend too: no region holds another). `spans`
   * never overlap them; `apply` refuses an insertion that does.
   */
  readonly protected: readonly ProtectedRegion[];
  readonly problems: readonly SourceProblem[];
}

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

/** A link after resolution. */
export interface ResolvedLink {
  /** Index of the page the link is on. */
  readonly from: number;
  /** Index of the target page, or -1. */
  readonly to: number;
  /** Resolved URL path (internal) or the absolute URL (external). */
  readonly target: string;
  readonly fragment: string;
  readonly kind: LinkKind;
  readonly status: LinkStatus;
  /**
   * Context after template detection: `raw.context`, or `template` when the same link (same
   * target and text) repeats on at least `templateShare` of the pages, or for navigation links.
   */
  readonly context: LinkContext;
  readonly raw: RawLink;
}

/** Compressed sparse rows: the neighbours of node i are `targets[offsets[i] .. offsets[i+1])`. */
export interface Csr {
  readonly offsets: Int32Array;
  readonly targets: Int32Array;
  /** Edge weights (sum of link weights between the pair). */
  readonly weights: Float32Array;
  /** Bit flags per edge: 1 = has a content link, 2 = has a template link. */
  readonly flags: Uint8Array;
}

/** A page in the graph. Node id = index in `SiteGraph.pages`. Pages are sorted by route. */
export interface PageNode {
  readonly id: number;
  /** Index of this page's facts in the array given to `buildGraph`. */
  readonly factsIndex: number;
  readonly route: string;
  readonly file: string;
  readonly title: string;
  readonly meta: PageMeta;
}

/** The site's internal link graph. */
export interface SiteGraph {
  readonly pages: readonly PageNode[];
  /** route (normalised) -> page id, including aliases and redirects. */
  readonly routeIndex: ReadonlyMap<string, number>;
  readonly links: readonly ResolvedLink[];
  readonly forward: Csr;
  readonly reverse: Csr;
  /** Ids of the entry pages that exist. */
  readonly entries: readonly number[];
  /** Entry routes from the config that match no page. */
  readonly missingEntries: readonly string[];
  /** Files whose route another file already has (the first by path is kept). */
  readonly duplicates: readonly { readonly file: string; readonly route: string; readonly keptFile: string }[];
  /** The heading-id style fragments were checked under, and how many fragment links it resolves. */
  readonly headingIds?: {
    readonly style: string;
    readonly how: 'auto' | 'set';
    readonly fragmentLinks: number;
    readonly resolved: number;
  };
  /** Includes whose file is not among the sources (once per path): the page's ids are unknown. */
  readonly includesOutside?: readonly { readonly file: string; readonly line: number; readonly column: number; readonly written: string }[];
}

/** Result of the ranking stage. Arrays are indexed by page id. */
export interface Ranking {
  readonly pagerank: Float64Array;
  /** Click depth from the entry pages; -1 = unreachable. */
  readonly depth: Int32Array;
  /** Distinct pages linking here (content or template). */
  readonly inlinks: Int32Array;
  /** Distinct pages linking here with at least one content link. */
  readonly contentInlinks: Int32Array;
  /** Distinct pages this page links to. */
  readonly outlinks: Int32Array;
  readonly iterations: number;
  readonly converged: boolean;
}

/** Sparse L2-normalised TF-IDF vectors, one per page, as CSR over term ids. */
export interface TermIndex {
  /** term id -> stemmed term */
  readonly terms: readonly string[];
  /** document frequency per term id */
  readonly df: Int32Array;
  readonly docOffsets: Int32Array;
  readonly docTerms: Int32Array;
  readonly docWeights: Float32Array;
}

/** Top-k related pages of one page. */
export interface RelatedList {
  readonly page: number;
  readonly related: readonly { readonly page: number; readonly similarity: number }[];
}

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
  readonly importance: 'high' | 'normal' | 'low';
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
