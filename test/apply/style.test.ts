import { describe, expect, it } from 'vitest';
import { chooseStyle, classifyHref, countStyles, majority } from '../../src/apply/index.js';
import type { RawLink } from '../../src/types.js';

const link = (href: string, origin: RawLink['origin'] = 'markdown'): RawLink => ({
  href,
  text: 't',
  line: 1,
  column: 1,
  context: 'content',
  nofollow: false,
  origin,
});

describe('classifyHref', () => {
  it.each([
    ['../guides/calibration.md', 'relative'],
    ['calibration.md#steps', 'relative'],
    ['./a/b.MDX', 'relative'],
    ['../legacy/faq.html', 'relative'],
    ['/guides/calibration/', 'absolute'],
    ['/guides/calibration.md', 'absolute'],
    ['/', 'absolute'],
    ['../calibration/', 'route-relative'],
    ['calibration', 'route-relative'],
    ['#steps', null],
    ['?q=1', null],
    ['https://example.org/a.md', null],
    ['mailto:someone@example.org', null],
    ['//cdn.example.org/x/', null],
    ['../img/diagram.png', null],
    ['/downloads/sheet.pdf', null],
    ['', null],
  ])('%s -> %s', (href, style) => {
    expect(classifyHref(href)).toBe(style);
  });
});

describe('countStyles and chooseStyle', () => {
  it('counts Markdown and HTML links, not navigation or pattern links; HTML relative links are one style', () => {
    const md = [link('a.md'), link('/b/'), link('../c/'), link('/d/', 'navigation'), link('e.md', 'pattern'), link('https://x.org/')];
    expect(countStyles(md, 'markdown')).toEqual({ relative: 1, absolute: 1, 'route-relative': 1 });
    const html = [link('faq.html', 'html'), link('../guides/', 'html'), link('/x/', 'html')];
    expect(countStyles(html, 'html')).toEqual({ relative: 2, absolute: 1, 'route-relative': 0 });
  });

  it('majority: none for no links or a tie', () => {
    expect(majority({ relative: 0, absolute: 0, 'route-relative': 0 })).toBeNull();
    expect(majority({ relative: 2, absolute: 2, 'route-relative': 0 })).toBeNull();
    expect(majority({ relative: 1, absolute: 3, 'route-relative': 2 })).toBe('absolute');
  });

  it('the flag, else the file, else the site, else relative; the site is only counted when needed', () => {
    let asked = 0;
    const site = () => {
      asked++;
      return { relative: 0, absolute: 5, 'route-relative': 0 };
    };
    expect(chooseStyle({ relative: 3, absolute: 0, 'route-relative': 0 }, site, 'route-relative')).toEqual({ style: 'route-relative', origin: 'flag' });
    expect(chooseStyle({ relative: 3, absolute: 1, 'route-relative': 0 }, site, null)).toEqual({ style: 'relative', origin: 'file' });
    expect(asked).toBe(0);
    expect(chooseStyle({ relative: 1, absolute: 1, 'route-relative': 0 }, site, null)).toEqual({ style: 'absolute', origin: 'site' });
    expect(chooseStyle({ relative: 0, absolute: 0, 'route-relative': 0 }, () => ({ relative: 0, absolute: 0, 'route-relative': 0 }), null)).toEqual({
      style: 'relative',
      origin: 'default',
    });
  });
});
