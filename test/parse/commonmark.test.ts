/**
 * Source: the CommonMark specification 0.31.2, as the npm package `commonmark-spec` ships its
 * examples (Markdown in, expected HTML out). For the sections on links, link reference
 * definitions, autolinks, raw HTML and images, every `<a href>` of the expected HTML must be
 * found by the Markdown link extractor with the same destination, and nothing else.
 *
 * Normalisation (both sides alike): the spec's HTML percent-encodes destinations (`foo%20b%C3%A4`)
 * while the extractor reports them as written after entity and escape decoding (`foo%20bä`), so
 * both are percent-decoded wherever a `%XX` run is valid UTF-8, and compared as sorted lists.
 */
import spec from 'commonmark-spec';
import rehypeParse from 'rehype-parse';
import { unified } from 'unified';
import { visit } from 'unist-util-visit';
import type { Element, Root } from 'hast';
import { describe, expect, it } from 'vitest';
import { md } from './helpers.js';

const SECTIONS = ['Links', 'Link reference definitions', 'Autolinks', 'Raw HTML', 'Images'];

/**
 * Examples where the shipped parser (CommonMark + GFM) finds links the spec does not: GFM
 * literal autolinks (https://github.github.com/gfm/, "Autolinks (extension)") turn bare URLs
 * and e-mail addresses in text into links. Each entry lists exactly the extra destinations.
 */
const GFM_EXTRA: Record<number, readonly string[]> = {
  602: ['https://foo.bar/baz'], // `<https://foo.bar/baz bim>`: not a CommonMark autolink (space); GFM links the bare URL
  606: ['mailto:foo+@bar.example.com'], // `<foo\+@bar.example.com>`: not an autolink (backslash); GFM links the address
  608: ['https://foo.bar'], // `< https://foo.bar >`: not an autolink (spaces); GFM links the bare URL
  611: ['https://example.com'], // bare URL: text in CommonMark, a literal autolink in GFM
  612: ['mailto:foo@bar.example.com'], // bare e-mail address: text in CommonMark, a literal autolink in GFM
};

const fragment = unified().use(rehypeParse, { fragment: true });

function expectedHrefs(html: string): string[] {
  const tree = fragment.parse(html) as Root;
  // One entry per `<a>` start tag: parse5 re-opens an `<a>` left open at `</p>` (WHATWG HTML,
  // "reconstruct the active formatting elements"), a copy with the same source position.
  const byStart = new Map<number, string>();
  visit(tree, 'element', (node: Element) => {
    if (node.tagName === 'a' && node.properties.href !== undefined && node.properties.href !== null) {
      byStart.set(node.position?.start.offset ?? -1 - byStart.size, String(node.properties.href));
    }
  });
  return [...byStart.values()];
}

/** Percent-decode every run of `%XX` escapes that is valid UTF-8; leave the rest. */
function decodePercent(s: string): string {
  return s.replace(/(?:%[0-9A-Fa-f]{2})+/g, (run) => {
    try {
      return decodeURIComponent(run);
    } catch {
      return run;
    }
  });
}

const norm = (hrefs: readonly string[]): string[] => hrefs.map(decodePercent).sort();

describe('CommonMark spec 0.31.2 examples (npm commonmark-spec): links found as the spec renders them', () => {
  const examples = spec.tests.filter((t) => SECTIONS.includes(t.section));
  it('covers the five sections', () => {
    expect(new Set(examples.map((e) => e.section))).toEqual(new Set(SECTIONS));
    expect(examples.length).toBeGreaterThan(150);
  });
  for (const ex of examples) {
    it(`example ${ex.number} (${ex.section})`, () => {
      // The spec writes tabs as → (its own convention).
      const markdown = ex.markdown.replace(/→/g, '\t');
      const found = md(markdown).links.map((l) => l.href);
      const expected = [...expectedHrefs(ex.html), ...(GFM_EXTRA[ex.number] ?? [])];
      expect(norm(found)).toEqual(norm(expected));
    });
  }
});
