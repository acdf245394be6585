import { describe, it, expect } from 'vitest';
import { evidenceWords, reasonText } from '../../src/suggest/reason.js';
import { FEATURES } from '../../src/suggest/features.js';
import type { AnchorMatch } from '../../src/suggest/anchor.js';
import { suggestionId } from '../../src/suggest/id.js';

describe('reasonText', () => {
  const base = { depth: 5, maxDepth: 3, contentInlinks: 1, minInlinks: 2, rankPercentile: 0.12, importancePercentile: 0.95 };
  const x = (values: Partial<Record<string, number>>): number[] => FEATURES.map((f) => values[f] ?? 0);
  const anchorAt: AnchorMatch = { offset: 10, endOffset: 24, line: 3, column: 5, text: 'trait objects', kind: 'name', words: 2, quality: 2 };

  it('names every reason of the target, then its strongest evidence in words, largest part first', () => {
    const features = x({ 'title-mention': 1, mentions: Math.log1p(2), similarity: 0.34, 'adamic-adar': 1, 'shared-folders': 1 });
    const contributions = x({ 'title-mention': 1.2, mentions: 0.4, similarity: 0.3, 'adamic-adar': 0.9, 'shared-folders': 0.1 });
    const text = reasonText(
      { ...base, reasons: ['orphan', 'unreachable'] },
      { features, contributions, above: FEATURES.map(() => true), anchor: anchorAt, commonNeighbours: 4, twoStep: 0, folder: '/guide/' },
    );
    expect(text).toBe('orphan page (no inlinks), unreachable from the entry pages; mentions "trait objects" (its title), and names it twice in all; 4 pages are linked with both; similar text (cosine 0.34, where 1 = the same words)');
    expect(text).not.toMatch(/adamic|title-mention|shared-folders/);
  });

  it('says the link needs a sentence written by hand when there is no anchor phrase', () => {
    const text = reasonText({ ...base, reasons: [] }, { features: x({ similarity: 0.5 }), contributions: x({ similarity: 1 }), above: FEATURES.map(() => true), anchor: null, commonNeighbours: 0, twoStep: 0, folder: '' });
    expect(text).toBe('related page; similar text (cosine 0.50, where 1 = the same words); no anchor phrase in the text: the link needs a sentence written by hand');
  });

  it('says where an anchor found without a name mention comes from (part of the title)', () => {
    const partial: AnchorMatch = { ...anchorAt, text: 'first week', kind: 'title' };
    const words = evidenceWords({ features: x({ similarity: 0.26 }), contributions: x({ similarity: 0.4 }), above: FEATURES.map(() => true), anchor: partial, commonNeighbours: 0, twoStep: 0, folder: '' });
    expect(words).toEqual(['"first week" is part of its title', 'similar text (cosine 0.26, where 1 = the same words)']);
  });

  it('leaves out evidence that lowered the score, and a part that rose only because the pair has less of it than usual', () => {
    const words = evidenceWords({ features: x({ 'target-inlinks': Math.log1p(40) }), contributions: x({ 'target-inlinks': -0.5 }), above: FEATURES.map(() => true), anchor: null, commonNeighbours: 0, twoStep: 0, folder: '' });
    expect(words).toEqual([]);
    // A negative weight times a value below the mean is a positive part: not "the source ranks high".
    const low = evidenceWords({ features: x({ 'source-rank': 0.1 }), contributions: x({ 'source-rank': 0.4 }), above: FEATURES.map(() => false), anchor: null, commonNeighbours: 0, twoStep: 0, folder: '' });
    expect(low).toEqual([]);
  });
});

describe('suggestionId', () => {
  it('is the first 12 hex digits of sha256(source \\n target \\n anchor), stable across versions', () => {
    // Values fixed when ids were introduced: a reviewer's accepted ids must keep working.
    expect(suggestionId('/guide/', '/api/tokens/', 'token scopes')).toBe('6336320dd4f8');
    expect(suggestionId('/guide/', '/api/tokens/', null)).toBe('52a7429a0825');
  });
});
