/**
 * Issue 7, "configuration and flags": every wrong key, type, range or unknown flag exits 2 with
 * one line naming it and what it accepts. Run in-process through `run()` (the code bin.ts
 * runs; test/cli/cli.test.ts runs the built command for a few of these, plus --help and
 * --version). The accepted values in the messages come from the schema in src/config/options.ts.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/run.js';
import { cleanupAll, project } from './helpers.js';

afterEach(cleanupAll);

async function cli(argv: string[], config?: unknown): Promise<{ code: number; stdout: string; stderr: string }> {
  const { dir } = project({
    'docs/index.md': '# Home\n',
    ...(config === undefined ? {} : { 'linkweave.config.json': JSON.stringify(config) }),
  });
  let stdout = '';
  let stderr = '';
  const code = await run(argv, {
    stdout: { write: (s: string) => (stdout += s) },
    stderr: { write: (s: string) => (stderr += s) },
    cwd: dir,
    env: {},
    isTTY: false,
  });
  return { code, stdout, stderr };
}

const TOP_KEYS =
  'include, exclude, routes, entry, navigation, redirects, linkPatterns, templateWeight, templateShare, depthCountsTemplate, teleport, damping';

describe('a wrong configuration exits 2 with one line naming the key and what it accepts', () => {
  it.each([
    ['unknown top-level key', { maxDepht: 3 }, `key "maxDepht": unknown key; accepted keys: ${TOP_KEYS},`],
    ['two unknown keys', { a: 1, b: 2 }, `key "a": unknown key \\(also unknown: "b"\\); accepted keys: ${TOP_KEYS},`],
    ['unknown nested key', { routes: { styel: 'html' } }, 'key "routes.styel": unknown key; accepted keys of "routes": style, basePath, indexNames, caseInsensitive, folders, dated, absoluteLinksUnderBase, generator, permalinks, headingIds, headingIdsDefault$'],
    ['unknown key in a list item', { linkPatterns: [{ pattern: 'x', route: 'y', flags: 'i' }] }, 'key "linkPatterns.0.flags": unknown key; accepted keys of "linkPatterns.0": pattern, route$'],
    ['unknown limits key', { limits: { orphan: 1 } }, 'key "limits.orphan": unknown key; accepted keys of "limits": brokenLinks, brokenFragments, orphans, '],
    ['enum value', { routes: { style: 'htm' } }, 'key "routes.style": expected one of "directory", "html", got "htm"$'],
    ['enum value', { failOn: 'info' }, 'key "failOn": expected one of "error", "warning", got "info"$'],
    ['whole number range', { maxDepth: -1 }, 'key "maxDepth": expected a whole number >= 0, got -1$'],
    ['whole number, a fraction', { maxDepth: 1.5 }, 'key "maxDepth": expected a whole number >= 0, got 1.5$'],
    ['whole number, a string', { maxDepth: '3' }, 'key "maxDepth": expected a whole number >= 0, got "3"$'],
    ['closed range', { templateWeight: 2 }, 'key "templateWeight": expected a number from 0 to 1, got 2$'],
    ['open range', { damping: 1 }, 'key "damping": expected a number > 0 and < 1, got 1$'],
    ['half-open range', { templateShare: 0 }, 'key "templateShare": expected a number > 0 and <= 1, got 0$'],
    ['positive', { maxFileBytes: 0 }, 'key "maxFileBytes": expected a whole number > 0, got 0$'],
    ['nullable number', { limits: { orphans: -1 } }, 'key "limits.orphans": expected a whole number >= 0, or null, got -1$'],
    ['boolean', { cache: { enabled: 'yes' } }, 'key "cache.enabled": expected true or false, got "yes"$'],
    ['list', { include: '**/*.md' }, 'key "include": expected a list of non-empty strings, got "\\*\\*/\\*\\.md"$'],
    ['empty list', { entry: [] }, 'key "entry": expected a list of non-empty strings \\(at least 1\\), got an empty list$'],
    ['list item', { exclude: [3] }, 'key "exclude.0": expected a non-empty string, got 3$'],
    ['missing key in a list item', { linkPatterns: [{ pattern: 'x' }] }, 'key "linkPatterns.0.route": expected a non-empty string, got nothing$'],
    ['bad regular expression', { linkPatterns: [{ pattern: '(', route: 'x' }] }, 'key "linkPatterns.0.pattern": not a valid regular expression'],
    ['nullable path', { navigation: 3 }, 'key "navigation": expected a non-empty string, or null, got 3$'],
    ['check level', { checks: { 'broken-link': { level: 'fatal' } } }, 'key "checks.broken-link.level": expected one of "error", "warning", "none", got "fatal"$'],
    ['check setting not an object', { checks: { 'broken-link': 'error' } }, 'key "checks.broken-link": expected an object: \\{ "level": "error", "warning" or "none", and the check\'s own options \\}, got "error"$'],
    ['unknown check', { checks: { 'broken-links': { level: 'error' } } }, 'key "checks.broken-links": no check has this id; the checks are broken-fragment, broken-link, '],
    ['check option type', { checks: { 'dead-end': { countTemplateLinks: 1 } } }, 'key "checks.dead-end.countTemplateLinks": expected true or false, got 1$'],
    ['unknown check option', { checks: { 'dead-end': { bogus: 1 } } }, 'key "checks.dead-end.bogus": unknown option; this check takes "level", "countTemplateLinks"$'],
    [
      'the old rule settings, rewritten in the new form',
      { rules: { 'orphan-page': 'off', 'dead-end': ['warn', { countTemplateLinks: true }], 'max-click-depth': ['error', { max: 4 }] } },
      'key "rules" is the old form of check settings; write it now as "checks": \\{"orphan-page":\\{"level":"none"\\},"dead-end":\\{"level":"warning","countTemplateLinks":true\\},"click-depth":\\{"level":"error"\\}\\} and "maxDepth": 4 \\(the one depth limit\\)$',
    ],
    [
      'the old gate, rewritten as limits',
      { gate: { maxDepth: 3, maxBrokenLinks: 6, minInlinksForImportant: 2 } },
      'key "gate" is now "limits"; write it as "limits": \\{"brokenLinks":6,"importantPageInlinks":2\\}; "gate.maxDepth" is gone: the depth limit is "maxDepth", and "checks": \\{"click-depth":\\{"level":"error"\\}\\} fails the run on it$',
    ],
    [
      'the old per-source key, renamed',
      { suggest: { maxNewLinksPerPage: 2 } },
      'key "suggest.maxNewLinksPerPage" is now "suggest.perSource" \\(0 = no cap\\): write "perSource": 2$',
    ],
    ['not an object', [1, 2], 'the configuration must be an object of keys, got a list of 2$'],
    ['base path', { routes: { basePath: 'docs' } }, 'key "routes.basePath": must start with "/", got "docs"$'],
  ])('%s: %j', async (_name, config, message) => {
    const r = await cli(['check', 'docs', '--no-cache'], config);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.split('\n').filter((l) => l !== '');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(new RegExp(`^linkweave: linkweave\\.config\\.json: ${message}`));
  });
});

describe('a wrong flag exits 2 with one line naming it and what it accepts', () => {
  it.each([
    [['check', 'docs', '--styel'], /^linkweave: unknown flag --styel for "check"; its flags: --config, --format, --output, /],
    [['check', 'docs', '-x'], /^linkweave: unknown flag "-x"; flags are written --name \(see --help\)$/],
    [['check', 'docs', '--fail-on', 'info'], /^linkweave: flag --fail-on: expected one of error, warning; got "info"$/],
    [['check', 'docs', '--max-depth', '-1'], /^linkweave: flag --max-depth: expected a whole number >= 0; got "-1"$/],
    [['check', 'docs', '--max-depth', '2.5'], /^linkweave: flag --max-depth: expected a whole number >= 0; got "2.5"$/],
    [['check', 'docs', '--output'], /^linkweave: flag --output needs a value: FILE$/],
    [['check', 'docs', '--quiet=yes'], /^linkweave: flag --quiet takes no value; got "yes"$/],
    [['check', 'docs', 'more'], /^linkweave: unexpected argument "more": "check" takes one content root at most$/],
    [[], /^linkweave: missing command; accepted commands: check, suggest, /],
  ])('%j', async (argv, message) => {
    const r = await cli(argv);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.split('\n').filter((l) => l !== '');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(message);
  });

  it('--help and --version exit 0 on stdout, whatever else is on the line', async () => {
    const help = await cli(['check', '--frobnicate', '--help']);
    expect(help).toMatchObject({ code: 0, stderr: '' });
    expect(help.stdout).toContain('Usage: linkweave check [root] [flags]');
    const version = await cli(['--version', '--format', 'xml']);
    expect(version).toMatchObject({ code: 0, stderr: '' });
    expect(version.stdout).toMatch(/^\d+\.\d+\.\d+\S*\n$/);
  });
});
