/**
 * The route style read from a site's own links when nothing sets it: Markdown that links
 * `fs.html` beside `fs.md` is built into `.html` pages (a hand-made build), so reading it with
 * folder routes would make every such link broken. Real files and the real pipeline.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { analyze } from '../../src/index.js';
import { styleFromLinks, STYLE_EVIDENCE_LINKS } from '../../src/routes/index.js';
import { tempDir, writeTree } from '../collect/tree.js';

const cleanups: (() => void)[] = [];
afterEach(() => {
  while (cleanups.length > 0) cleanups.pop()!();
});

const md = (path: string, text: string) => ({ path, kind: 'markdown', text });
const NAMES = ['fs', 'http', 'net', 'path', 'url', 'zlib'];

/** An API reference: an index that links each module as `<name>.html`, modules that link each other. */
function reference(): Record<string, string> {
  const tree: Record<string, string> = {
    'index.md': `# API\n\n${NAMES.map((n) => `* [${n}](${n}.html)`).join('\n')}\n`,
  };
  NAMES.forEach((n, i) => {
    const next = NAMES[(i + 1) % NAMES.length];
    tree[`${n}.md`] = `# ${n}\n\nSee [${next}](${next}.html#top) and the [index](index.html).\n\n[ref]: ${next}.html\n`;
  });
  return tree;
}

describe('styleFromLinks', () => {
  it('counts relative .html links of Markdown sources that name a Markdown source, inline and in reference definitions', () => {
    const read = styleFromLinks([
      md('a/index.md', '[x](x.html) [y](../y.html#frag "t") [abs](/z.html) [web](https://e.org/q.html) [gone](gone.html)\n\n[r]: x.html\n'),
      md('a/x.md', ''),
      md('y.md', ''),
      { path: 'page.html', kind: 'html', text: '<a href="x.html">x</a> [y](y.html)' },
    ]);
    // x.html twice, ../y.html and gone.html: 4 relative links, 3 naming a source.
    expect(read).toEqual({ htmlLinks: 4, naming: 3, style: null });
  });

  it(`chooses .html routes from ${STYLE_EVIDENCE_LINKS} naming links when they are at least half`, () => {
    const files = Object.entries(reference()).map(([p, t]) => md(p, t));
    // 6 on the index; per module its neighbour (inline and a reference definition) and the index.
    expect(styleFromLinks(files)).toEqual({ htmlLinks: 24, naming: 24, style: 'html' });
    const few = [md('i.md', '[a](a.html) [b](b.html) [c](c.html) [d](d.html)'), ...['a', 'b', 'c', 'd'].map((n) => md(`${n}.md`, ''))];
    expect(styleFromLinks(few).style).toBeNull();
    const mostlyMissing = [md('i.md', [...NAMES, 'q1', 'q2', 'q3', 'q4', 'q5', 'q6', 'q7'].map((n) => `[${n}](${n}.html)`).join(' ')), ...NAMES.map((n) => md(`${n}.md`, ''))];
    expect(styleFromLinks(mostlyMissing).style).toBeNull();
  });
});

describe('a run with no route style set', () => {
  it('reads a site whose Markdown links name .html pages with .html routes, says so, and finds no broken link', async () => {
    const { dir, cleanup } = tempDir();
    cleanups.push(cleanup);
    writeTree(dir, reference());
    const notes: string[] = [];
    const report = await analyze({ root: dir, command: 'check', cache: { enabled: false } }, { onNote: (n) => notes.push(n) });
    expect(report.pages.map((p) => p.route).sort()).toEqual(['/', '/fs.html', '/http.html', '/net.html', '/path.html', '/url.html', '/zlib.html']);
    expect(report.findings.filter((f) => f.rule === 'broken-link')).toEqual([]);
    expect(notes).toContain('routes: .html pages (chosen by the links: 24 of 24 relative .html links name a Markdown source); set routes.style to choose');
  });

  it('keeps the style the configuration sets', async () => {
    const { dir, cleanup } = tempDir();
    cleanups.push(cleanup);
    writeTree(dir, reference());
    const notes: string[] = [];
    const report = await analyze({ root: dir, command: 'check', cache: { enabled: false }, routes: { style: 'directory' } }, { onNote: (n) => notes.push(n) });
    expect(report.pages.map((p) => p.route)).toContain('/fs/');
    // The index's six links and each module's link to its neighbour (index.html is the home page either way).
    expect(report.findings.filter((f) => f.rule === 'broken-link').length).toBe(12);
    expect(notes.some((n) => n.startsWith('routes:'))).toBe(false);
  });
});
