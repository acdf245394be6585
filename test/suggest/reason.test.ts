import { describe, it, expect } from 'vitest';
import { reasonText } from '../../src/suggest/reason.js';
import { suggestionId } from '../../src/suggest/id.js';

describe('reasonText', () => {
  const base = { depth: 5, maxDepth: 3, contentInlinks: 1, minInlinks: 2, rankPercentile: 0.12, importancePercentile: 0.95, anchor: 'title' as const };

  it('names every reason of the target and where the anchor came from', () => {
    expect(reasonText({ ...base, reasons: ['orphan', 'unreachable'] })).toBe(
      "orphan page (no inlinks), unreachable from the entry pages; anchor matches the target's title",
    );
    expect(reasonText({ ...base, reasons: ['too-deep', 'few-inlinks', 'rank-below-importance'], anchor: 'alias' })).toBe(
      '5 clicks deep (limit 3), important page with 1 content inlink (minimum 2), PageRank percentile 12 far below importance percentile 95; ' +
        "anchor matches the target's route",
    );
  });

  it('says "no anchor phrase" and "related page" for a target that is not under-linked', () => {
    expect(reasonText({ ...base, reasons: [], anchor: null })).toBe('related page; no anchor phrase');
  });
});

describe('suggestionId', () => {
  it('is the first 12 hex digits of sha256(source \\n target \\n anchor), stable across versions', () => {
    // Values fixed when ids were introduced: a reviewer's accepted ids must keep working.
    expect(suggestionId('/guide/', '/api/tokens/', 'token scopes')).toBe('6336320dd4f8');
    expect(suggestionId('/guide/', '/api/tokens/', null)).toBe('52a7429a0825');
  });
});
