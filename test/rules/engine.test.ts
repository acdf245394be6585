import { describe, expect, it } from 'vitest';
import { EngineError } from '../../src/errors.js';
import { resolveOptions } from '../../src/config/options.js';
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
      'a/b/c/d.md:1:1 warning click-depth',
      'index.md:4:2 error broken-link',
      'lost.md:1:1 error orphan-page',
    ]);
  });

  it('skips checks at level none and applies the configured level and options', () => {
    const found = runRules(
      buildSite({
        ...site,
        options: { maxDepth: 4, checks: { 'orphan-page': { level: 'none' }, 'unreachable-page': { level: 'warning' }, 'click-depth': { level: 'error' } } },
      }),
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
  const check = (checks: unknown) => () => validateRuleConfig(resolveOptions({ checks }, '/site'), 'linkweave.config.json');

  it('names an unknown check id and lists the known ones', () => {
    expect(check({ 'broken-links': { level: 'error' } })).toThrow(EngineError);
    expect(check({ 'broken-links': { level: 'error' } })).toThrow(
      `linkweave.config.json: key "checks.broken-links": no check has this id; the checks are ${rules.map((r) => r.id).join(', ')}`,
    );
  });

  it('names an unknown option and lists the accepted ones', () => {
    expect(check({ 'orphan-page': { level: 'error', countTemplate: false } })).toThrow(
      'linkweave.config.json: key "checks.orphan-page.countTemplate": unknown option; this check takes "level", "countTemplateLinks"',
    );
  });

  it('names an option of the wrong type', () => {
    expect(check({ 'orphan-page': { level: 'warning', countTemplateLinks: 'no' } })).toThrow(/key "checks\.orphan-page\.countTemplateLinks": /);
  });

  it('refuses options for a check that takes none (the depth limit is maxDepth, not a click-depth option)', () => {
    expect(check({ 'broken-link': { level: 'error', ignore: [] } })).toThrow(
      'linkweave.config.json: key "checks.broken-link.ignore": this check takes only "level"',
    );
    expect(check({ 'click-depth': { limit: 2 } })).toThrow('key "checks.click-depth.limit": this check takes only "level"');
  });

  it('returns each rule with its configured level (null when unset) and merged options', () => {
    const settings = validateRuleConfig(resolveOptions({ checks: { 'orphan-page': { countTemplateLinks: false }, 'dead-end': { level: 'none' } } }, '/site'));
    const byId = Object.fromEntries(settings.map((s) => [s.rule.id, { level: s.level, options: s.options }]));
    expect(byId['dead-end']).toEqual({ level: 'none', options: { countTemplateLinks: false } });
    expect(byId['orphan-page']).toEqual({ level: null, options: { countTemplateLinks: false } });
    expect(byId['click-depth']).toEqual({ level: null, options: {} });
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
      'click-depth',
      'dead-end',
      'duplicate-route',
      'missing-entry',
      'orphan-page',
      'source-problem',
      'unreachable-page',
    ]);
  });
});
