import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, posix } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { unified } from 'unified';
import remarkParse from 'remark-parse';
import { visit } from 'unist-util-visit';
import type { Link } from 'mdast';
import { CONFIG_FILE, NAV_FILE, generateSite, generateSiteInMemory, relinkOne } from '../../bench/generate.js';
import { COMMON_WORDS, FUNCTION_WORDS } from '../../bench/site/words.js';

const dirs: string[] = [];
function tempDir(): string {
  const d = mkdtempSync(join(tmpdir(), 'lw-gen-'));
  dirs.push(d);
  return d;
}
afterAll(() => {
  for (const d of dirs) rmSync(d, { recursive: true, force: true });
});

function listFiles(root: string, rel = ''): string[] {
  const out: string[] = [];
  for (const name of readdirSync(join(root, rel))) {
    const p = rel === '' ? name : `${rel}/${name}`;
    if (statSync(join(root, p)).isDirectory()) out.push(...listFiles(root, p));
    else out.push(p);
  }
  return out.sort();
}

function hashTree(root: string): string {
  const h = createHash('sha256');
  for (const f of listFiles(root)) h.update(f).update('\0').update(readFileSync(join(root, f))).update('\0');
  return h.digest('hex');
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Route of a file under the default directory style (DESIGN section 3). */
function routeOf(file: string): string {
  const noExt = file.replace(/\.md$/, '');
  if (noExt === 'index') return '/';
  return noExt.endsWith('/index') ? `/${noExt.slice(0, -6)}/` : `/${noExt}/`;
}

const PAGES = 400;
const site = generateSiteInMemory({ pages: PAGES, seed: 11 });
const markdown = [...site.contents].filter(([p]) => p.endsWith('.md'));
const processor = unified().use(remarkParse);
const linksOf = new Map<string, string[]>();
for (const [path, text] of markdown) {
  const hrefs: string[] = [];
  visit(processor.parse(text), 'link', (node: Link) => {
    hrefs.push(node.url);
  });
  linksOf.set(path, hrefs);
}

describe('generateSite', () => {
  it('is deterministic: the same seed writes the same bytes, another seed does not', () => {
    const a = tempDir();
    const b = tempDir();
    const c = tempDir();
    generateSite(a, { pages: 250, seed: 5 });
    generateSite(b, { pages: 250, seed: 5 });
    generateSite(c, { pages: 250, seed: 6 });
    expect(hashTree(a)).toBe(hashTree(b));
    expect(hashTree(a)).not.toBe(hashTree(c));
  });

  it('writes exactly the requested number of pages, plus nav.yml and the config', () => {
    const d = tempDir();
    const result = generateSite(d, { pages: 250, seed: 3 });
    const files = listFiles(d);
    expect(files.filter((f) => f.endsWith('.md'))).toHaveLength(250);
    expect(files).toContain(NAV_FILE);
    expect(files).toContain(CONFIG_FILE);
    expect(result.files).toBe(files.length);
    expect(result.bytes).toBe(files.reduce((s, f) => s + statSync(join(d, f)).size, 0));
    const config = JSON.parse(readFileSync(join(d, CONFIG_FILE), 'utf8')) as { navigation: string; entry: string[] };
    expect(config.navigation).toBe(NAV_FILE);
    expect(config.entry).toEqual(['/']);
  });

  it('writes the same files to disk as it builds in memory', () => {
    const d = tempDir();
    generateSite(d, { pages: PAGES, seed: 11 });
    for (const [path, text] of site.contents) expect(readFileSync(join(d, path), 'utf8')).toBe(text);
    expect(listFiles(d)).toEqual([...site.contents.keys()].sort());
  });

  it('nests folders, each with an index page', () => {
    const folders = new Set(markdown.map(([p]) => posix.dirname(p)));
    expect(folders.size).toBeGreaterThan(2);
    for (const f of folders) expect(site.contents.has(f === '.' ? 'index.md' : `${f}/index.md`)).toBe(true);
    expect(Math.max(...[...folders].map((f) => (f === '.' ? 0 : f.split('/').length)))).toBeGreaterThanOrEqual(2);
  });

  it('makes pages of a few kilobytes with front matter, headings, lists, code and tables', () => {
    const sizes = markdown.map(([, t]) => Buffer.byteLength(t));
    expect(median(sizes)).toBeGreaterThanOrEqual(3000);
    expect(median(sizes)).toBeLessThanOrEqual(6000);
    const all = markdown.map(([, t]) => t);
    expect(all.every((t) => /^---\ntitle: "[^"]+"\n---\n/.test(t))).toBe(true);
    expect(all.every((t) => /^## /m.test(t))).toBe(true);
    expect(all.filter((t) => /^```[a-z]+\n/m.test(t)).length).toBeGreaterThan(PAGES / 4);
    expect(all.filter((t) => /^\| --- \|/m.test(t)).length).toBeGreaterThan(PAGES / 20);
    expect(all.filter((t) => /^- /m.test(t)).length).toBeGreaterThan(PAGES / 2);
  });

  it('has a heavy-tailed out-degree: most pages 5-30 links, a few hubs far above the median', () => {
    const degrees = [...linksOf.values()].map((l) => l.length);
    const m = median(degrees);
    expect(m).toBeGreaterThanOrEqual(5);
    expect(m).toBeLessThanOrEqual(30);
    expect(Math.max(...degrees)).toBeGreaterThan(8 * m);
    expect(degrees.filter((d) => d >= 5 && d <= 30).length / degrees.length).toBeGreaterThan(0.6);
  });

  it('links mostly to pages that exist, in both relative .md and site-absolute form, with a few broken ones', () => {
    const routes = new Set(markdown.map(([p]) => routeOf(p)));
    let relative = 0;
    let absolute = 0;
    let broken = 0;
    let fragments = 0;
    for (const [path, hrefs] of linksOf) {
      for (const href of hrefs) {
        if (href.startsWith('https://')) continue;
        const [target, fragment] = href.split('#');
        if (fragment !== undefined) fragments++;
        let route: string;
        if (target!.startsWith('/')) {
          absolute++;
          route = target!;
        } else {
          relative++;
          route = routeOf(posix.normalize(posix.join(posix.dirname(path), target!)));
        }
        if (!routes.has(route)) broken++;
      }
    }
    expect(relative).toBeGreaterThan(absolute);
    expect(absolute).toBeGreaterThan(0);
    expect(fragments).toBeGreaterThan(0);
    expect(broken).toBeGreaterThan(0);
    expect(broken / (relative + absolute)).toBeLessThan(0.02);
  });

  it('repeats a shared footer on more than half of the pages (template links)', () => {
    const footer = /^## See also\n\n- \[Getting started\]\(\/getting-started\/\)$/m;
    const share = markdown.filter(([, t]) => footer.test(t)).length / markdown.length;
    expect(share).toBeGreaterThan(0.5);
  });

  it('writes a nav.yml whose entries are routes of pages of the site', () => {
    const nav = parseYaml(site.contents.get(NAV_FILE)!) as { title: string; link: string }[];
    const routes = new Set(markdown.map(([p]) => routeOf(p)));
    expect(nav.length).toBeGreaterThan(3);
    for (const entry of nav) {
      expect(typeof entry.title).toBe('string');
      expect(routes.has(entry.link)).toBe(true);
    }
  });

  it('returns a cluster for every page, and pages of one cluster share far more topic words than pages of two', () => {
    const routes = markdown.map(([p]) => routeOf(p)).sort();
    expect(Object.keys(site.clusters).sort()).toEqual(routes);
    expect(new Set(Object.values(site.clusters)).size).toBeGreaterThan(2);
    const everyday = new Set([...COMMON_WORDS, ...FUNCTION_WORDS]);
    const topicWords = (t: string): Set<string> => new Set((t.toLowerCase().match(/[a-z]{4,}/g) ?? []).filter((w) => !everyday.has(w)));
    const words = new Map(markdown.map(([p, t]) => [routeOf(p), topicWords(t)]));
    const jaccard = (a: Set<string>, b: Set<string>): number => {
      let shared = 0;
      for (const w of a) if (b.has(w)) shared++;
      return shared / (a.size + b.size - shared);
    };
    let same = 0;
    let sameN = 0;
    let other = 0;
    let otherN = 0;
    for (let i = 0; i < routes.length; i += 3) {
      for (let j = i + 1; j < routes.length; j += 7) {
        const s = jaccard(words.get(routes[i]!)!, words.get(routes[j]!)!);
        if (site.clusters[routes[i]!] === site.clusters[routes[j]!]) {
          same += s;
          sameN++;
        } else {
          other += s;
          otherN++;
        }
      }
    }
    expect(sameN).toBeGreaterThan(10);
    expect(same / sameN).toBeGreaterThan(3 * (other / otherN));
  });

  it('rejects a page count that is not a positive integer', () => {
    expect(() => generateSiteInMemory({ pages: 0 })).toThrow(/"pages"/);
  });
});

describe('relinkOne (the bench run where one link target changes)', () => {
  it('points the first relative link that is not to index.md at index.md, words and other links unchanged', () => {
    const text = 'See [home](index.md#top) and [Install the tool](../guide/install.md#steps), then [x](other.md).\n';
    expect(relinkOne(text)).toBe('See [home](index.md#top) and [Install the tool](index.md), then [x](other.md).\n');
    expect(relinkOne('Only [home](index.md) and [site](https://example.org/a.md).\n')).toBeNull();
  });
});
