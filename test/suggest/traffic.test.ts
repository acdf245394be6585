import { describe, it, expect } from 'vitest';
import { parseTraffic } from '../../src/suggest/traffic.js';

describe('parseTraffic', () => {
  it('reads route,views rows after an optional header, adding up repeated routes', () => {
    const { views, problems } = parseTraffic('traffic.csv', '\uFEFFroute,views\r\n/guide/,120\r\n/api/,30\n\n# a comment\n/guide/,5\n');
    expect(problems).toEqual([]);
    expect([...views]).toEqual([
      ['/guide/', 125],
      ['/api/', 30],
    ]);
  });

  it('takes the path of full URLs and of routes with a query, and reads quoted fields', () => {
    const { views } = parseTraffic('t.csv', '"https://docs.example.test/guide/install/?ref=nav",7\n"/a,b/",2.5\n/c/?x=1,1\n');
    expect([...views]).toEqual([
      ['/guide/install/', 7],
      ['/a,b/', 2.5],
      ['/c/', 1],
    ]);
  });

  it('reports each bad row with its line and keeps the good ones', () => {
    const text = ['route,views', '/ok/,3', 'guide,4', '/x/,many', '/y/,-2', '/z/', '/w/,1,2', '"/open,3'].join('\n');
    const { views, problems } = parseTraffic('t.csv', text);
    expect([...views]).toEqual([['/ok/', 3]]);
    expect(problems.map((p) => p.line)).toEqual([3, 4, 5, 6, 7, 8]);
    expect(problems[0]!.message).toBe('Traffic row route "guide" is not a route; start it with "/" or give an http(s) URL');
    expect(problems[1]!.message).toBe('Traffic row views "many" is not a count; write a number of 0 or more');
    expect(problems[3]!.message).toBe('Traffic row has 1 field; write two: "route,views"');
    expect(problems[4]!.message).toBe('Traffic row has 3 fields; write two: "route,views"');
    expect(problems[5]!.message).toMatch(/quoted field that is never closed/);
  });

  it('treats a first row with numeric views as data, not as a header', () => {
    expect([...parseTraffic('t.csv', '/,10\n').views]).toEqual([['/', 10]]);
  });
});
