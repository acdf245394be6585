import { describe, expect, it } from 'vitest';
import { EngineError } from '../../src/errors.js';
import { resolveOptions } from '../../src/options.js';
import { rules, runRules, validateRuleConfig } from '../../src/rules/index.js';
import { buildSite } from './helpers.js';

/** A site with one finding of several rules. */
const site = {
  pages: [
    { route: '/', links: [{ to: '/gone/', line: 4, column: 2 }, '/a/'] },
    { route: '/a/', links: ['/a/b/'] },
    { route: '/a/b/', links: ['/a/b/c/'] },
    { route: '/a/b/c/', links: ['/a/b/c/d/'] },
    { route: '/a/b/c/d/', links: ['/'] },
    { route: '/lost/', links: ['/'] },
  ],
} as const;

describe('runRules', () => {
  it('runs every rule and sorts by file, line, column, rule', () => {
    const found = runRules(buildSite(site));
    expect(found.map((f) => `${f.file}:${f.line}:${f.column} ${f.severity} ${f.rule}`)).toEqual([
      'a/b/c/d.md:1:1 warning max-click-depth',
      'index.md:4:2 error broken-link',
      'lost.md:1:1 error orphan-page',
    ]);
  });

  it('skips rules that are off and applies [severity, options]', () => {
    const found = runRules(
      buildSite({ ...site, options: { rules: { 'orphan-page': 'off', 'unreachable-page': 'warn', 'max-click-depth': ['error', { max: 4 }] } } }),
    );
    // /lost/ is an orphan: unreachable-page leaves orphans to orphan-page, which is off here.
    expect(found.map((f) => `${f.rule} ${f.severity}`)).toEqual(['broken-link error']);
  });

  it('drops every finding on a page marked linkweave.exclude', () => {
    const found = runRules(buildSite({ pages: [{ route: '/', links: ['/a/'] }, { route: '/a/', links: ['/'] }, { route: '/lost/', exclude: true, links: ['/gone/'] }] }));
    expect(found).toEqual([]);
  });

  it('stamps target only when the rule gives one', () => {
    const [broken, orphan] = runRules(buildSite({ pages: [{ route: '/', links: ['/gone/'] }, { route: '/x/', links: ['/'] }] })).filter(
      (f) => f.rule === 'broken-link' || f.rule === 'orphan-page',
    );
    expect(broken).toMatchObject({ rule: 'broken-link', target: '/gone/' });
    expect(orphan).not.toHaveProperty('target');
  });
});

describe('validateRuleConfig', () => {
  const check = (rulesConfig: unknown) => () => validateRuleConfig(resolveOptions({ rules: rulesConfig }, '/site'), 'linkweave.config.json');

  it('names an unknown rule id and lists the known ones', () => {
    expect(check({ 'broken-links': 'error' })).toThrow(EngineError);
    expect(check({ 'broken-links': 'error' })).toThrow(
      `linkweave.config.json: key "rules.broken-links": unknown rule, expected one of ${rules.map((r) => `"${r.id}"`).join(', ')}`,
    );
  });

  it('names an unknown option and lists the accepted ones', () => {
    expect(check({ 'max-click-depth': ['error', { maximum: 2 }] })).toThrow(
      'linkweave.config.json: key "rules.max-click-depth.maximum": unknown option, expected one of "max"',
    );
  });

  it('names an option of the wrong type', () => {
    expect(check({ 'orphan-page': ['warning', { countTemplateLinks: 'no' }] })).toThrow(/key "rules\.orphan-page\.countTemplateLinks": /);
  });

  it('refuses options for a rule that takes none', () => {
    expect(check({ 'broken-link': ['error', { ignore: [] }] })).toThrow(
      'linkweave.config.json: key "rules.broken-link.ignore": the rule takes no options, expected "error" alone',
    );
  });

  it('returns each rule with its configured severity (null when unset) and merged options', () => {
    const settings = validateRuleConfig(resolveOptions({ rules: { 'max-click-depth': ['error', { max: 2 }], 'dead-end': 'off' } }, '/site'));
    const byId = Object.fromEntries(settings.map((s) => [s.rule.id, { severity: s.severity, options: s.options }]));
    expect(byId['max-click-depth']).toEqual({ severity: 'error', options: { max: 2 } });
    expect(byId['dead-end']).toEqual({ severity: 'off', options: { countTemplateLinks: false } });
    expect(byId['orphan-page']).toEqual({ severity: null, options: { countTemplateLinks: true } });
  });
});

describe('rule metadata', () => {
  it('every rule has a kebab-case id, a sentence and sorted, unique ids', () => {
    const ids = rules.map((r) => r.id);
    expect(ids).toEqual([...new Set(ids)].sort());
    for (const rule of rules) {
      expect(rule.id).toMatch(/^[a-z]+(-[a-z]+)*$/);
      expect(rule.description).toMatch(/^[A-Z].*\.$/);
    }
    expect(ids).toEqual([
      'broken-fragment',
      'broken-link',
      'dead-end',
      'duplicate-route',
      'max-click-depth',
      'missing-entry',
      'orphan-page',
      'source-problem',
      'unreachable-page',
    ]);
  });
});
