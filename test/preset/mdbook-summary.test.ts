/**
 * mdBook builds the chapters SUMMARY.md names and nothing else (rust-lang.github.io/mdBook/format/summary.html,
 * from memory): a Markdown file it does not name is no page (unless another file includes it),
 * and a chapter it names that has no file is created by the build (`build.create-missing`,
 * default true). A SUMMARY.md made at build time from a `SUMMARY.md.in` template (as the Nix
 * manual does) is read from the template.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';

const temps: string[] = [];
afterAll(() => {
  for (const t of temps) fs.rmSync(t, { recursive: true, force: true });
});

function site(files: Record<string, string>): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lw-mdbook-'));
  temps.push(dir);
  for (const [name, text] of Object.entries(files)) {
    fs.mkdirSync(path.dirname(path.join(dir, name)), { recursive: true });
    fs.writeFileSync(path.join(dir, name), text);
  }
  return dir;
}

describe('mdBook chapters', () => {
  it('only named chapters are pages; a named chapter with no file is made by the build; SUMMARY.md.in stands in', async () => {
    const root = site({
      'book.toml': '[book]\ntitle = "B"\n',
      'src/SUMMARY.md.in': '# Summary\n\n- [Intro](intro.md)\n- [Guide](guide/start.md)\n- [Builtins](builtins.md)\n@extra@\n',
      'src/intro.md': '# Intro\n\nSee [the builtins](builtins.md) and [old notes](old.md).\n',
      'src/guide/start.md': '# Start\n\n{{#include ../parts/common.md}}\n',
      'src/parts/common.md': 'Shared text with [the intro](../intro.md).\n',
      'src/old.md': '# Old\n\nNot in the summary.\n',
    });
    const notes: string[] = [];
    const report = await analyze({ root, cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
    expect(notes[0]).toBe(
      'read as an mdBook site from book.toml: src/, SUMMARY.md.in, 1 file not in SUMMARY.md.in left out, 1 chapter made at build time\n' +
        '  SUMMARY.md is made at build time; SUMMARY.md.in read in its place',
    );
    expect(report.pages.map((p) => p.file)).toEqual(['guide/start.md', 'intro.md']);
    const status = (to: string) => report.links.find((l) => l.file === 'intro.md' && l.to === to)?.status;
    // builtins.md is made by the build: never broken; old.md is not built: really broken.
    expect(status('builtins.md')).toBe('outside');
    expect(status('old.md')).toBe('broken');
    // The included part is read (its link counts for guide/start.md) though it is no chapter.
    expect(report.links.find((l) => l.file === 'parts/common.md')).toMatchObject({ from: '/guide/start.html', to: '/intro.html', status: 'ok' });
  });

  it('a folder the build files name, with no source and no chapter, is made at build when the template has a placeholder line', async () => {
    const files = {
      'book.toml': '[book]\ntitle = "B"\n',
      'local.mk': 'out/src/SUMMARY.md: out/src/SUMMARY.md.in $(d)/src/ref/made\n\tgen-summary $< > $@\n\n$(d)/src/ref/made: gen.nix\n\tfor i in out/src/ref/made/*.md; do echo $$i; done\n',
      'src/SUMMARY.md.in': '# Summary\n\n- [Intro](intro.md)\n- [Reference](ref/index.md)\n@pages@\n',
      'src/intro.md': '# Intro\n\nSee [the made page](ref/made/cmd.md), [a typo](ref/indx.md) and [another folder](other/cmd.md).\n',
      'src/ref/index.md': '# Reference\n',
    };
    const notes: string[] = [];
    const report = await analyze({ root: site(files), cache: { enabled: false }, workers: 1 }, { onNote: (m) => notes.push(m) });
    expect(notes[0]).toBe(
      'read as an mdBook site from book.toml: src/, SUMMARY.md.in, 1 folder made at build time\n' +
        '  SUMMARY.md is made at build time; SUMMARY.md.in read in its place\n' +
        '  src/ref/made/ is made at build time (named by the build files, no source in it): links into it are outside the content',
    );
    const status = (r: typeof report, to: string) => r.links.find((l) => l.file === 'intro.md' && l.to === to)?.status;
    // Made at build: outside, listed with its position; a typo in the existing folder ref/ and a
    // folder the build files do not name stay broken.
    expect(report.links.find((l) => l.to === 'ref/made/cmd.md')).toMatchObject({ status: 'outside', line: 3, column: 5 });
    expect(status(report, 'ref/indx.md')).toBe('broken');
    expect(status(report, 'other/cmd.md')).toBe('broken');
    expect(report.stats.brokenLinks).toBe(2);

    // Without the placeholder line the summary is complete: the same link is broken.
    const plain = await analyze(
      { root: site({ ...files, 'src/SUMMARY.md.in': '# Summary\n\n- [Intro](intro.md)\n- [Reference](ref/index.md)\n' }), cache: { enabled: false }, workers: 1 },
      { onNote: () => undefined },
    );
    expect(status(plain, 'ref/made/cmd.md')).toBe('broken');
    // A folder with a source in it is no made folder: links to its missing files are broken.
    const withSource = await analyze(
      { root: site({ ...files, 'src/ref/made/old.md': '# Old\n' }), cache: { enabled: false }, workers: 1 },
      { onNote: () => undefined },
    );
    expect(status(withSource, 'ref/made/cmd.md')).toBe('broken');
  });
});
