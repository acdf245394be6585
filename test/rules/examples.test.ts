/**
 * The ok / not-ok examples in each rule's TSDoc, run for real: Markdown sources through
 * `parseSource`, `buildGraph` and `rankGraph`, then the rule alone. The expected lines are the
 * ones the TSDoc shows (STYLE section 2.13: docs are tests).
 */
import { describe, expect, it } from 'vitest';
import { buildGraph } from '../../src/graph/index.js';
import { resolveOptions } from '../../src/config/options.js';
import type { Config } from '../../src/config/options.js';
import { parseSource } from '../../src/parse/index.js';
import { rankGraph } from '../../src/rank/index.js';
import {
  brokenFragment,
  brokenLink,
  deadEnd,
  duplicateRoute,
  clickDepth,
  missingEntry,
  orphanPage,
  runRules,
  sourceProblem,
  unreachablePage,
} from '../../src/rules/index.js';
import type { Rule } from '../../src/rules/index.js';

/** Run `rule` on a site given as file -> Markdown; findings as `file:line:column  severity  message`. */
function check(rule: Rule, files: Record<string, string>, config: Config = {}): string[] {
  const options = resolveOptions(config, '/site');
  const facts = Object.keys(files)
    .sort()
    .map((path) =>
      parseSource({ path, kind: 'markdown', bytes: files[path]!.length, hash: path, text: files[path]!, problems: [] }, options),
    );
  const graph = buildGraph({ pages: facts, assets: [], navigation: null, redirects: [] }, options);
  const ranking = rankGraph(graph, options);
  return runRules({ graph, facts, ranking, options, warnings: [] }, [rule]).map(
    (f) => `${f.file}:${f.line}:${f.column}  ${f.severity}  ${f.message}`,
  );
}

describe('rule documentation examples', () => {
  it('broken-link', () => {
    const site = {
      'index.md': '[Guide](guide/index.md)\n',
      'guide/install.md': '# Install\n',
    };
    expect(check(brokenLink, { ...site, 'guide/index.md': 'Read [the install guide](install.md) or [the install page](/guide/install/).\n' })).toEqual([]);
    expect(check(brokenLink, { ...site, 'guide/index.md': 'Read [the install guide](instal.md) or [the install page](/guide/instal/).\n' })).toEqual([
      'guide/index.md:1:6  error  Broken link: no source file guide/instal.md (written "instal.md"); did you mean guide/install.md?',
      'guide/index.md:1:40  error  Broken link: no page /guide/instal/; did you mean /guide/install/?',
    ]);
    expect(check(brokenLink, { ...site, 'guide/index.md': '[Setup](setup.md)\n', 'guide/setup.md': 'Read [the install guide](install#requirements) first.\n' })).toEqual([
      'guide/setup.md:1:6  error  Broken link: no page /guide/setup/install (written "install#requirements"); did you mean install.md#requirements?',
    ]);
    expect(check(brokenLink, { ...site, 'guide/index.md': 'Open [the site](https://) to start.\n' })).toEqual([
      'guide/index.md:1:6  error  Broken link: "https://" is not a well-formed address; fix or remove the link',
    ]);
  });

  it('broken-fragment', () => {
    const site = { 'guide/install.md': '# Install\n\n## Set up\n' };
    expect(check(brokenFragment, { ...site, 'guide/index.md': 'See [setting up](install.md#set-up).\n' })).toEqual([]);
    expect(check(brokenFragment, { ...site, 'guide/index.md': 'See [setting up](install.md#setup).\n' })).toEqual([
      'guide/index.md:1:5  error  Broken fragment: /guide/install/ has no heading or id "setup"; did you mean #set-up?',
    ]);
  });

  it('orphan-page', () => {
    expect(check(orphanPage, { 'index.md': '[About](about.md)\n', 'about.md': '# About\n' })).toEqual([]);
    expect(check(orphanPage, { 'index.md': '[Guide](guide.md)\n', 'guide.md': '# Guide\n', 'old/notes.md': '# Notes\n' })).toEqual([
      'old/notes.md:1:1  error  No page links to /old/notes/; link it from /',
    ]);
  });

  it('unreachable-page', () => {
    const chain = { 'index.md': '[Guide](guide/index.md)\n', 'guide/index.md': '[Install](install.md)\n', 'guide/install.md': '# Install\n' };
    expect(check(unreachablePage, chain)).toEqual([]);
    expect(
      check(unreachablePage, { ...chain, 'archive/index.md': '[2019](2019.md)\n', 'archive/2019.md': '[Archive](index.md)\n' }),
    ).toEqual([
      'archive/2019.md:1:1  error  /archive/2019/ cannot be reached from /: only /archive/ links to it; link it from a reachable page',
      'archive/index.md:1:1  error  /archive/ cannot be reached from /: only /archive/2019/ links to it; link it from a reachable page',
    ]);
  });

  it('click-depth', () => {
    const chain = { 'index.md': '[A](a.md)\n', 'a.md': '[B](a/b.md)\n', 'a/b.md': '[C](b/c.md)\n', 'a/b/c.md': '# C\n' };
    // Depth 3 is allowed; the chain really reaches a/b/c.md (with max 2 it is reported).
    expect(check(clickDepth, chain)).toEqual([]);
    expect(check(clickDepth, chain, { maxDepth: 2 })).toHaveLength(1);
    expect(check(clickDepth, { ...chain, 'a/b/c.md': '[D](c/d.md)\n', 'a/b/c/d.md': '# D\n' })).toEqual([
      'a/b/c/d.md:1:1  warning  /a/b/c/d/ is 4 clicks from an entry page, over the limit of 3; link it from a page nearer the top',
    ]);
  });

  it('dead-end', () => {
    const index = { 'index.md': '[Install](guide/install.md) [FAQ](guide/faq.md)\n' };
    expect(check(deadEnd, { ...index, 'guide/install.md': 'Next: [configure](configure.md)\n', 'guide/configure.md': '[Home](../index.md)\n', 'guide/faq.md': '[Start again](../index.md)\n' })).toEqual([]);
    expect(check(deadEnd, { ...index, 'guide/install.md': '[Home](../index.md)\n', 'guide/faq.md': 'Ask on [the forum](https://forum.example.org/).\n' })).toEqual([
      'guide/faq.md:1:1  warning  Dead end: /guide/faq/ has no content links to other pages; add a link onward',
    ]);
  });

  it('source-problem', () => {
    expect(check(sourceProblem, { 'guide/setup.md': '---\ntitle: Setup\n---\n# Setup\n' })).toEqual([]);
    const found = check(sourceProblem, { 'guide/setup.md': '---\ntitle: [unclosed\n---\n# Setup\n' });
    // The message is the parse stage's (the YAML library's reason plus what happens next).
    expect(found).toEqual([
      'guide/setup.md:2:17  warning  Invalid YAML frontmatter: Flow sequence in block collection must be sufficiently indented and end with a ]; the page is read without its frontmatter',
    ]);
  });

  it('duplicate-route', () => {
    expect(check(duplicateRoute, { 'guide.md': '# Guide\n', 'guide/index.md': '---\nslug: /guide-overview/\n---\n# Overview\n' })).toEqual([]);
    expect(check(duplicateRoute, { 'guide.md': '# Guide\n', 'guide/index.md': '# Overview\n' })).toEqual([
      'guide/index.md:1:1  error  Route /guide/ already belongs to guide.md; give this file another route (a slug) or remove it',
    ]);
  });

  it('missing-entry', () => {
    expect(check(missingEntry, { 'index.md': '# Home\n' })).toEqual([]);
    expect(check(missingEntry, { 'index.md': '# Home\n', 'stars.md': '# Stars\n' }, { entry: ['/', '/start/'] })).toEqual([
      ':1:1  error  No page has the entry route /start/; correct "entry" in the configuration (did you mean /stars/?)',
    ]);
  });
});
