/**
 * Small hand-built sites for the rule and report tests: a compact description in, the
 * `SiteGraph`, `PageFacts[]` and `Ranking` out, made by the real stages (`buildGraph`,
 * `rankGraph`) from facts as the parse stage gives them.
 */
import { posix } from 'node:path';
import { resolveOptions } from '../../src/config/options.js';
import type { Config, ResolvedOptions } from '../../src/config/options.js';
import { buildGraph } from '../../src/graph/index.js';
import { rankGraph } from '../../src/rank/index.js';
import type { LinkContext, PageFacts, PageMeta, RawLink, SourceProblem } from '../../src/types.js';
import type { RuleContext, SourceWarning } from '../../src/rules/index.js';

/**
 * A link in a test site: `to` is a route (`/a/`, `/a/#frag`), an absolute URL, or, for a
 * broken link to a source file, the file's path from the root (`guide/x.md`), as the graph
 * gives it. A missing path with a file extension other than a source one is a missing asset.
 */
export interface LinkSpec {
  readonly to: string;
  readonly href?: string;
  readonly text?: string;
  readonly line?: number;
  readonly column?: number;
  readonly context?: LinkContext;
  readonly nofollow?: boolean;
}

/** A page of a test site. */
export interface PageSpec {
  readonly route: string;
  /** Default: the route turned into a Markdown path (`/a/b/` -> `a/b.md`, `/` -> `index.md`). */
  readonly file?: string;
  readonly title?: string;
  readonly links?: readonly (string | LinkSpec)[];
  readonly ids?: readonly string[];
  readonly exclude?: boolean;
  readonly importance?: 'high' | 'normal' | 'low';
  readonly problems?: readonly SourceProblem[];
}

/** A whole test site. */
export interface SiteSpec {
  readonly pages: readonly PageSpec[];
  /** Links of a navigation file (`_nav.md`), added as template edges from every page. */
  readonly navigation?: readonly (string | LinkSpec)[];
  /** Asset files of the site, paths from the root (`img/logo.png`). */
  readonly assets?: readonly string[];
  readonly options?: Config;
  readonly warnings?: readonly SourceWarning[];
  /** Extra facts (drafts, files that failed to parse, a second file of one route). */
  readonly extraFacts?: readonly PageFacts[];
}

/** Default file of a route. */
export function fileOf(route: string): string {
  return route === '/' ? 'index.md' : `${route.replace(/^\/|\/$/g, '')}.md`;
}

function meta(spec: PageSpec): PageMeta {
  return {
    draft: false,
    noindex: false,
    aliases: [],
    exclude: spec.exclude ?? false,
    ...(spec.importance === undefined ? {} : { importance: spec.importance }),
  };
}

/** Facts of a file as `parse` would give them (no text or spans). */
export function factsOf(spec: PageSpec, problems: readonly SourceProblem[] = spec.problems ?? []): PageFacts {
  return {
    file: spec.file ?? fileOf(spec.route),
    kind: 'markdown',
    hash: 'h',
    route: spec.route,
    title: spec.title ?? spec.route,
    meta: meta(spec),
    headings: [],
    ids: [...(spec.ids ?? [])].sort(),
    links: [],
    text: { title: '', headings: '', body: '' },
    spans: [],
    protected: [],
    problems,
  };
}

function linkOf(spec: string | LinkSpec): LinkSpec {
  return typeof spec === 'string' ? { to: spec } : spec;
}

/** The link as the parse stage would hand it over: the href as written in file `file`. */
function rawLink(spec: LinkSpec, file: string, context: LinkContext, origin: RawLink['origin']): RawLink {
  return {
    href: hrefOf(spec, file),
    text: spec.text ?? 'link',
    line: spec.line ?? 1,
    column: spec.column ?? 1,
    context: spec.context ?? context,
    nofollow: spec.nofollow ?? false,
    origin,
  };
}

/** `href` when given; otherwise a route or URL as is, and a file path from the root made relative to `file`. */
function hrefOf(spec: LinkSpec, file: string): string {
  if (spec.href !== undefined) return spec.href;
  if (spec.to.startsWith('/') || /^[a-z][a-z0-9+.-]*:/i.test(spec.to)) return spec.to;
  return posix.relative(posix.dirname(`/${file}`), `/${spec.to}`);
}

/**
 * Build the rule context of a test site through the real graph and rank stages: the facts as
 * `parse` would give them (files in path order, as collect sorts them; links as written), then
 * `buildGraph` (link resolution, template links, the navigation file) and `rankGraph`.
 */
export function buildSite(spec: SiteSpec): RuleContext {
  const options: ResolvedOptions = resolveOptions(
    { ...(spec.navigation === undefined ? {} : { navigation: NAVIGATION_FILE }), ...spec.options },
    '/site',
  );
  const facts = spec.pages
    .map((s): PageFacts => ({ ...factsOf(s), links: (s.links ?? []).map((l) => rawLink(linkOf(l), s.file ?? fileOf(s.route), 'content', 'markdown')) }))
    .concat(spec.extraFacts ?? [])
    .sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : 0));
  const navigation =
    spec.navigation === undefined
      ? null
      : { file: NAVIGATION_FILE, links: spec.navigation.map((l) => rawLink(linkOf(l), NAVIGATION_FILE, 'template', 'navigation')) };
  const graph = buildGraph({ pages: facts, assets: [...(spec.assets ?? [])], navigation, redirects: [] }, options);
  return { graph, facts, ranking: rankGraph(graph, options), options, warnings: spec.warnings ?? [] };
}

/** The navigation file of a test site that has one. */
export const NAVIGATION_FILE = '_nav.md';
