import type { Config } from '../../src/config/options.js';

/** A small invented site (Markdown and HTML) used by the cache tests. */

/** path -> content. */
export const SITE: Record<string, string> = {
  'index.md': [
    '---',
    'title: Harbour Lamp handbook',
    '---',
    '# Harbour Lamp handbook',
    '',
    'Start with [setup](guide/setup.md), then read about [wick care](guide/wicks.md).',
    'The [glass guide](reference/glass.html) lists every shade. See {{ref "guide/oil.md"}} for oil.',
    '',
  ].join('\n'),
  'guide/index.md': '# Guide\n\nThe guide covers [setup](setup.md), [wicks](wicks.md) and [oil](oil.md).\n',
  'guide/setup.md': [
    '---',
    'title: Setting up the lamp',
    'aliases: [/old/setup/]',
    '---',
    '# Setting up',
    '',
    '## Unpacking',
    '',
    'Lift the lamp from its crate and check the brass collar for dents.',
    'Fill the reservoir with lamp oil before the first lighting; the [oil page](oil.md#grades) says which grade.',
    '',
    '```sh',
    'lamp --check collar',
    '```',
    '',
  ].join('\n'),
  'guide/wicks.md': '# Wick care\n\nTrim the wick flat so the flame burns evenly. A sooty chimney means the wick is too high.\n\nBack to the [handbook](../index.md).\n',
  'guide/oil.md': '# Oil\n\n## Grades\n\nParaffin oil burns clean. Kerosene smells stronger and needs a wider [chimney](../reference/glass.html#chimneys).\n',
  'reference/glass.html': [
    '<!doctype html><html><head><title>Glass shades</title></head><body>',
    '<nav><a href="/">Home</a> <a href="/guide/">Guide</a></nav>',
    '<h1>Glass shades</h1>',
    '<p>Clear, frosted and amber shades fit the standard collar. Read the <a href="/guide/setup/">setup notes</a> first.</p>',
    '<h2 id="chimneys">Chimneys</h2><p>A tall chimney draws more air and gives a steadier flame.</p>',
    '<p><a href="https://example.com/supplier" rel="nofollow">A supplier</a></p>',
    '</body></html>',
  ].join('\n'),
  'reference/START.md': '# Reference start\n\nThe reference holds the [glass shades](glass.html).\n',
};

/** A configuration with a link pattern, so `linkPatterns` takes part. */
export const CONFIG: Config = {
  linkPatterns: [{ pattern: '\\{\\{ref "([^"]+)"\\}\\}', route: '$1' }],
};
