/**
 * The fitted choice among a pair's anchor options (`src/suggest/anchor-choice.ts`): learned from
 * the site's own links against the mentions their authors passed over, used to order the options,
 * and left out below its least number of linked pairs. And inline code named as written.
 */
import { describe, expect, it } from 'vitest';
import { anchorFeatures, ANCHOR_FEATURES, fitAnchorChoice, MIN_ANCHOR_GROUPS } from '../../src/suggest/anchor-choice.js';
import type { AnchorGroup, AnchorOptionFacts } from '../../src/suggest/anchor-choice.js';
import { buildMentionIndex, codeKey } from '../../src/suggest/mentions.js';
import { factsByPage } from '../../src/suggest/facts-of.js';
import { createStemCache } from '../../src/text/index.js';
import { markdownPage, siteInput, testOptions } from './helpers.js';

/** Made-up words with distinct stems, none a stop word. */
const WORDS = Array.from({ length: 60 }, (_, i) => `zor${'bcdfghjklmnpqrstvwxz'[i % 20]}${'aeiou'[Math.floor(i / 20)]}k`);

/**
 * A site whose authors link a thing by its section name (`<word>Start`, camelCase in prose, a
 * heading of the target) and pass over the target's title ("Gadget <Word>") written earlier in
 * the same page; plus a page `fresh` that mentions the title and the section name of a target no
 * page links yet.
 */
function site(linkingPages: number) {
  const options = testOptions();
  const words = WORDS.slice(0, linkingPages + 1);
  const fresh = words[linkingPages];
  const pages = [
    markdownPage('index.md', `# Home\n\n${words.map((w) => `- [${w}](g/${w}.md)`).join('\n')}\n- [Fresh](fresh.md)\n${words.slice(0, linkingPages).map((w) => `- [s ${w}](s/${w}.md)`).join('\n')}\n`),
    ...words.map((w) => markdownPage(`g/${w}.md`, `# Gadget ${w}\n\nWhat it is.\n\n## ${w}Start\n\nHow it starts.\n`)),
    ...words.slice(0, linkingPages).map((w) => markdownPage(`s/${w}.md`, `# Notes on ${w}\n\nThe Gadget ${w} unit sits on the shelf.\n\nTo begin, call [${w}Start](../g/${w}.md) once.\n`)),
    markdownPage('fresh.md', `# Fresh\n\nThe Gadget ${fresh} unit sits on the shelf.\n\nTo begin, call ${fresh}Start once.\n`),
  ];
  const input = siteInput(pages, options);
  const id = (route: string) => input.graph.pages.findIndex((p) => p.route === route);
  const index = buildMentionIndex(input.graph, factsByPage(input), createStemCache());
  return { index, hit: index.bySource[id('/fresh/')]!.get(id(`/g/${fresh}/`))!, fresh };
}

describe('the fitted anchor choice', () => {
  it('learns that this site links the section name, not the title written before it', () => {
    const { index, hit, fresh } = site(40);
    expect(index.anchorChoice).not.toBeNull();
    expect(index.anchorChoice!.groups).toBe(40);
    const w = (name: (typeof ANCHOR_FEATURES)[number]) => index.anchorChoice!.model.weights[ANCHOR_FEATURES.indexOf(name)];
    expect(w('heading')).toBeGreaterThan(w('title'));
    expect(hit.anchors.map((a) => [a.text, a.line])).toEqual([
      [`${fresh}Start`, 5],
      [`Gadget ${fresh}`, 3],
    ]);
  });

  it(`keeps the fixed order (title before a section name) below ${MIN_ANCHOR_GROUPS} linked pairs`, () => {
    const { index, hit, fresh } = site(MIN_ANCHOR_GROUPS - 1);
    expect(index.anchorChoice).toBeNull();
    expect(hit.anchors.map((a) => a.text)).toEqual([`Gadget ${fresh}`, `${fresh}Start`]);
  });

  it('skips groups with no passed-over option, and fits the same model from the same groups', () => {
    const option = (o: Partial<AnchorOptionFacts>): AnchorOptionFacts => ({ linkedToTarget: 0, linked: 0, total: 4, placementRate: 0.2, kind: 1, place: 0, order: 0, words: 1, quoted: false, exact: false, formLinkedToTarget: -1, formTotal: 0, ...o });
    // Authors link the option that is not first, in code.
    const groups: AnchorGroup[] = Array.from({ length: 50 }, (_, i) => ({
      options: [option({ order: 0, words: 1 + (i % 3) }), option({ order: 1, place: 1, kind: 4 })],
      linked: [false, true],
    }));
    const lonely: AnchorGroup = { options: [option({})], linked: [true] };
    const a = fitAnchorChoice([...groups, lonely]);
    const b = fitAnchorChoice(groups);
    expect(a).not.toBeNull();
    expect(a!.groups).toBe(50);
    expect(a!.options).toBe(100);
    expect(a).toEqual(b);
    const score = (o: AnchorOptionFacts) => anchorFeatures(o).reduce((s, x, j) => s + (a!.model.weights[j] * (x - a!.model.means[j])) / a!.model.scales[j], a!.model.intercept);
    expect(score(option({ order: 1, place: 1, kind: 4 }))).toBeGreaterThan(score(option({ order: 0 })));
  });
});

describe('the anchor features', () => {
  it('give one value per named feature, each in its place', () => {
    const o = { linkedToTarget: 3, linked: 4, total: 9, placementRate: 0.5, kind: 4, place: 1, order: 2, words: 2, quoted: false, exact: true, formLinkedToTarget: 1, formTotal: 5 };
    const x = anchorFeatures(o);
    expect(x).toHaveLength(ANCHOR_FEATURES.length);
    const at = (name: (typeof ANCHOR_FEATURES)[number]) => x[ANCHOR_FEATURES.indexOf(name)];
    expect(at('phrase-odds')).toBeCloseTo(Math.log(3.5 / 10), 12);
    expect(at('placement-rate')).toBeCloseTo(Math.log(0.5), 12);
    expect([at('heading'), at('title'), at('code'), at('alone'), at('first')]).toEqual([1, 0, 1, 0, 0]);
    expect(at('order')).toBeCloseTo(Math.log(3), 12);
    expect([at('words'), at('quoted'), at('exact-code')]).toEqual([2, 0, 1]);
    // Code: the written form's own record (1 link to the target in 5 occurrences).
    expect(at('form-odds')).toBeCloseTo(Math.log(1.5 / 6), 12);
    // Words have no written form: the phrase's record stands in.
    const words = anchorFeatures({ ...o, place: 0, exact: false, formLinkedToTarget: -1, formTotal: 0 });
    expect(words[ANCHOR_FEATURES.indexOf('form-odds')]).toBeCloseTo(Math.log(3.5 / 10), 12);
  });
});

describe('code a page writes as its own name', () => {
  it('is the page speaking of itself, not a mention of another page with a section of that name', () => {
    const section = (title: string) => `# ${title}\n\nAbout it.\n\n## \`response.finished\`\n\nTrue once the response is sent.\n`;
    const pages = [
      markdownPage('index.md', '# Home\n\n- [HTTP](http.md)\n- [HTTP/2](http2.md)\n- [Changes](changes.md)\n'),
      markdownPage('http.md', section('HTTP')),
      markdownPage('http2.md', `${section('HTTP/2')}\nCheck \`response.finished\` before writing.\n`),
      markdownPage('changes.md', '# Changes\n\nThe `response.finished` property is deprecated.\n'),
    ];
    const input = siteInput(pages, testOptions());
    const id = (route: string) => input.graph.pages.findIndex((p) => p.route === route);
    const { bySource } = buildMentionIndex(input.graph, factsByPage(input), createStemCache());
    const code = (from: string, to: string) => bySource[id(from)]!.get(id(to))?.anchors.filter((a) => a.kind === 'code').map((a) => [a.text, a.line]) ?? [];
    expect(code('/http2/', '/http/')).toEqual([]);
    expect(code('/changes/', '/http/')).toEqual([['`response.finished`', 3]]);
    expect(code('/changes/', '/http2/')).toEqual([['`response.finished`', 3]]);
  });
});

describe('the link record of a written form of code', () => {
  it('counts `Error` apart from `error` and `\'error\'` (one form: the quotes are no words), though all are the same stems', () => {
    const pages = [
      markdownPage('index.md', `# Home\n\n- [Errors](errors.md)\n- [Streams](streams.md)\n- [Files](files.md)\n${['Timers', 'Paths', 'Sockets', 'Zones'].map((t) => `- [${t}](${t.toLowerCase()}.md)`).join('\n')}\n`),
      // Enough pages that two links alike are content, not a template.
      ...['Timers', 'Paths', 'Sockets', 'Zones'].map((t) => markdownPage(`${t.toLowerCase()}.md`, `# ${t}\n\nAbout ${t.toLowerCase()}.\n`)),
      markdownPage('errors.md', '# Errors\n\nWhat can go wrong.\n'),
      markdownPage('streams.md', "# Streams\n\nA stream emits `'error'` and passes an [`Error`](errors.md) to the handler.\n\nThe handler reads `error.code`.\n"),
      markdownPage('files.md', "# Files\n\nOn failure the callback gets an [`Error`](errors.md); name it `error` or `err`.\n\nListen for `'error'` too.\n"),
    ];
    const input = siteInput(pages, testOptions());
    const errors = input.graph.pages.findIndex((p) => p.route === '/errors/');
    const { codeForms } = buildMentionIndex(input.graph, factsByPage(input), createStemCache());
    expect(codeForms.linkedTo.get('Error')).toEqual(new Map([[errors, 2]]));
    expect(codeForms.total.get('Error')).toBe(2);
    expect(codeForms.linkedTo.get('error')).toBeUndefined();
    expect(codeForms.total.get('error')).toBe(3);
    // `error.code` and `err` name no page: they are no mentions and not counted.
    expect(codeForms.total.get('error code')).toBeUndefined();
    expect(codeForms.total.get('err')).toBeUndefined();
  });
});

describe('names as written', () => {
  it.each([
    ['`http2.get()`', 'http2 get'],
    ["`'/p/a/t/h?query=string'`", 'p a t h query string'],
    ['`fs.readFile()`', 'fs readfile'],
    ['`Buffer`', 'buffer'],
  ])('%s is written %s', (code, key) => {
    expect(codeKey(code)).toBe(key);
  });

  /**
   * The mentions `guide.md` makes of the other pages of a site: an index linking every page,
   * the pages (file -> title), and the guide's prose. Keyed by route.
   */
  function mentionsFrom(titles: Record<string, string>, guide: string): Map<string, string[]> {
    const files = Object.keys(titles);
    const pages = [
      markdownPage('index.md', `# Home\n\n${files.map((f) => `- [${titles[f]}](${f})`).join('\n')}\n- [Guide](guide.md)\n`),
      ...files.map((f) => markdownPage(f, `# ${titles[f]}\n\nAbout it.\n`)),
      markdownPage('guide.md', `# Guide\n\n${guide}\n`),
    ];
    const input = siteInput(pages, testOptions());
    const from = input.graph.pages.findIndex((p) => p.route === '/guide/');
    const hits = buildMentionIndex(input.graph, factsByPage(input), createStemCache()).bySource[from]!;
    return new Map([...hits].map(([t, hit]) => [input.graph.pages[t]!.route, hit.anchors.map((a) => a.text)]));
  }

  it('a quoted path that holds the words of a title, or a call whose last word is a stop word, names no page', () => {
    const from = mentionsFrom(
      { 'querystring.md': 'Query string', 'http.md': 'HTTP', 'stream.md': 'Stream' },
      "The path `'/p/a/t/h?query=string'` is an example; `http.get()` fetches it.\n\nAll `Streams` end.",
    );
    // Every word kept: a plural still names its page.
    expect(from).toEqual(new Map([['/stream/', ['`Streams`']]]));
  });

  it('a route whose words the tokenizer partly drops is no name: /n-api/ is not "API", /child-process/ is "child process"', () => {
    const from = mentionsFrom({ 'n-api.md': 'Native interface', 'child-process.md': 'Spawning' }, 'The API is stable. Start a child process to run it.');
    expect(from).toEqual(new Map([['/child-process/', ['child process']]]));
  });

  it('a mention written exactly as one page is named is not a mention of pages whose names only stem alike ("HTTPS", "HTTP/2" and "HTTP" all stem to "http")', () => {
    const from = mentionsFrom({ 'http.md': 'HTTP', 'https.md': 'HTTPS', 'http2.md': 'HTTP/2' }, 'Serve it over HTTPS.');
    expect(from).toEqual(new Map([['/https/', ['HTTPS']]]));
  });
});
