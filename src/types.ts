/**
 * The plain data passed between the pipeline's stages (DESIGN section 2). The parts of the
 * public JSON report (`Report`, `Finding`, `Suggestion`...) are defined in `report/schema.ts`
 * and re-exported here, as the stages make them.
 *
 * collect -> SourceFile[] -> parse -> PageFacts[] -> graph -> SiteGraph
 *   -> rank -> Ranking -> text -> TermIndex/Related -> suggest -> Suggestion[]
 *   -> rules -> Finding[] -> report -> Report
 *
 * Everything here is readonly data. Typed arrays are used where a stage's hot loop needs them;
 * the report stage maps them back to JSON-friendly arrays.
 */
import type { Importance, LinkContext, LinkKind, LinkStatus, Severity, Finding, UnderlinkedReason, Suggestion, LinkModelReport, ReportPage, ReportLink, GateFailure, Report, BaselineResult, PageChange, Comparison, RepairPlan } from './report/schema.js';

export type { Importance, LinkContext, LinkKind, LinkStatus, Severity, Finding, UnderlinkedReason, Suggestion, LinkModelReport, ReportPage, ReportLink, GateFailure, Report, BaselineResult, PageChange, Comparison, RepairPlan } from './report/schema.js';

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
  /** The visible text is one inline code span and nothing else (`` [`x()`](y) ``, `<a><code>x()</code></a>`). */
  readonly code?: true;
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
 * An inline code span in prose (Markdown `` `name()` ``, an HTML `<code>` element; outside links,
 * headings and templates, on one line): a place where a link may wrap the whole span, as API
 * references link their code names. `offset`/`endOffset` cover the span with its backticks or
 * tags, exactly one `code` protected region; `apply` wraps it whole or not at all.
 */
export interface CodeSpan {
  /** The span as written, backticks or tags included (the source between `offset` and `endOffset`). */
  readonly text: string;
  /** The code as it reads (what a link around it has as `RawLink.text`), white space collapsed. */
  readonly code: string;
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
  /** `type`: the page type, which picks the generator's page template (Hugo). */
  readonly type?: string;
  /** `categories` (or `category`), for Jekyll's `:categories`. */
  readonly categories?: readonly string[];
  readonly draft: boolean;
  readonly noindex: boolean;
  readonly aliases: readonly string[];
  /** `linkweave.importance` */
  readonly importance?: Importance;
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

/** A fitted logistic regression. `weights[j]` is the weight of feature j on the standardised scale. */
export interface LogisticModel {
  readonly intercept: number;
  readonly weights: readonly number[];
  readonly means: readonly number[];
  readonly scales: readonly number[];
  readonly iterations: number;
  readonly converged: boolean;
}

/**
 * Where the suggest stage keeps its last fit (the cache folder's, `src/cache/model.ts`), under
 * `fitKey` of the rows and labels: the fit is a function of those alone, so the model is the
 * same with or without one. `get` returns null for an unknown key (or a store it cannot read).
 */
export interface FitMemo {
  get(key: string): LogisticModel | null;
  set(key: string, model: LogisticModel): void;
}

/**
 * Where the text stage keeps the related lists of its last term index (the cache folder's,
 * `src/cache/related.ts`), under `relatedKey`: the lists are a function of the index and k alone,
 * so they are the same with or without one. `get` returns null for an unknown key (or a store it
 * cannot read).
 */
export interface RelatedMemo {
  get(key: string, pages: number): RelatedList[] | null;
  set(key: string, lists: readonly RelatedList[]): void;
}
