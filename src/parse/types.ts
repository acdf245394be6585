/**
 * Types of the parse stage: the redirect record it exports, and the draft it fills while walking
 * one file (offsets only; line/column are computed once at the end from the line table).
 */
import type { LinkContext, LinkOrigin, PageMeta, ProtectedRegion, SourceProblem } from '../types.js';

/** One line of a redirects file: `from to`. */
export interface Redirect {
  readonly from: string;
  readonly to: string;
  /** 1-based line in the redirects file. */
  readonly line: number;
}

/** A problem found in an auxiliary file (redirects, navigation), by line. */
export interface LineProblem {
  readonly line: number;
  readonly message: string;
}

/** A link found while walking, positioned by offset. */
export interface LinkDraft {
  /** UTF-16 offset of the link's start in the parsed text. */
  offset: number;
  href: string;
  text: string;
  context: LinkContext;
  nofollow: boolean;
  origin: LinkOrigin;
  fileRelative?: boolean;
  code?: true;
}

/** A heading found while walking. */
export interface HeadingDraft {
  readonly depth: number;
  readonly text: string;
  readonly slug: string;
  readonly offset: number;
  /** The id is written in the source (`{#id}`). */
  readonly explicit?: true;
  /** The text given to the heading-id style, when it differs from `text`. */
  readonly raw?: string;
}

/** A span candidate: `text === source.slice(offset, offset + text.length)`, one line at most. */
export interface SpanDraft {
  readonly text: string;
  readonly offset: number;
}

/** A problem found while walking, positioned by offset when it has a place. */
export interface ProblemDraft {
  readonly code: SourceProblem['code'];
  readonly message: string;
  readonly offset?: number;
}

/** Everything collected from one file before it becomes `PageFacts`. */
export interface PageDraft {
  readonly links: LinkDraft[];
  readonly headings: HeadingDraft[];
  readonly ids: string[];
  readonly spans: SpanDraft[];
  /** Body text pieces (joined with nothing; block ends add a newline). */
  readonly body: string[];
  /** Code ranges `[start, end)` in offset order (pairs), where link patterns do not apply. */
  readonly code: number[];
  /** Inline code in prose that a link may wrap whole: its source text (backticks included) and range `[offset, end)`. */
  readonly codeSpans: { text: string; code: string; offset: number; end: number }[];
  readonly problems: ProblemDraft[];
  /** Protected regions the walk found (link definitions); the rest come from `protect.ts`. */
  readonly protected: ProtectedRegion[];
  /**
   * Template text shown as code (`{{< highlight >}}`/`{{< code >}}` bodies, `{% highlight %}`,
   * `{% comment %}`), `[start, end)` pairs found by `protect.ts`: the Markdown parser saw links
   * and headings there, but the generator shows the text as written (or drops it). An escaped
   * shortcode in prose is not one: Hugo writes it out as text, and its Markdown is still read.
   */
  readonly codeBodies: number[];
  firstH1?: string;
  htmlTitle?: string;
  baseHref?: string;
}

/** A fresh, empty draft. */
export function newDraft(): PageDraft {
  return { links: [], headings: [], ids: [], spans: [], body: [], code: [], codeSpans: [], problems: [], protected: [], codeBodies: [] };
}

/** A file read into a draft, with its frontmatter. */
export interface Read {
  readonly draft: PageDraft;
  readonly meta: PageMeta;
  /** Frontmatter `title`, when given. */
  readonly title?: string;
}
