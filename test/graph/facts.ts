/**
 * Hand-written PageFacts literals for the graph and rank tests (the graph stage is tested on its
 * own, without the parser).
 */
import { resolveOptions } from '../../src/config/options.js';
import type { Config, ResolvedOptions } from '../../src/config/options.js';
import type { FileKind, PageFacts, RawLink } from '../../src/types.js';

/** A link as the parser would report it; `line` is the link's position in the page. */
export function link(href: string, line = 1, over: Partial<RawLink> = {}): RawLink {
  return { href, text: over.text ?? href, line, column: over.column ?? 1, context: 'content', nofollow: false, origin: 'markdown', ...over };
}

/** Options of a page literal. */
export interface PageSpec {
  links?: (string | RawLink)[];
  ids?: string[];
  kind?: FileKind;
  aliases?: string[];
  draft?: boolean;
  baseHref?: string;
  title?: string;
}

/** Facts of one page; string links get lines 1, 2, 3... */
export function page(file: string, route: string, spec: PageSpec = {}): PageFacts {
  const links = (spec.links ?? []).map((l, i) => (typeof l === 'string' ? link(l, i + 1) : l));
  return {
    file,
    kind: spec.kind ?? (file.endsWith('.html') || file.endsWith('.htm') ? 'html' : 'markdown'),
    hash: 'h-' + file,
    route,
    title: spec.title ?? file,
    meta: { draft: spec.draft ?? false, noindex: false, aliases: spec.aliases ?? [], exclude: false },
    headings: [],
    ids: [...(spec.ids ?? [])].sort(),
    links,
    ...(spec.baseHref === undefined ? {} : { baseHref: spec.baseHref }),
    text: { title: spec.title ?? file, headings: '', body: '' },
    spans: [],
    protected: [],
    problems: [],
  };
}

/** Resolved options over a config literal (root is a fixed invented path; nothing is read). */
export function options(config: Config = {}): ResolvedOptions {
  return resolveOptions(config, '/site');
}
