/** The `reason` text of a suggestion: why the target wants links and where the anchor came from. */
import type { UnderlinkedReason } from '../types.js';
import type { AnchorKind } from './anchor.js';

/** Facts about the target that the reason mentions. */
export interface ReasonFacts {
  readonly reasons: readonly UnderlinkedReason[];
  readonly depth: number;
  readonly maxDepth: number;
  readonly contentInlinks: number;
  readonly minInlinks: number;
  readonly rankPercentile: number;
  readonly importancePercentile: number;
  readonly anchor: AnchorKind | null;
}

const ANCHOR_WORDS: Record<AnchorKind, string> = {
  title: "anchor matches the target's title",
  alias: "anchor matches the target's route",
  'key-terms': "anchor matches the target's key terms",
};

/** e.g. `orphan page, 5 clicks deep (limit 3); anchor matches the target's title`. */
export function reasonText(f: ReasonFacts): string {
  const parts = f.reasons.map((r) => {
    switch (r) {
      case 'orphan':
        return 'orphan page (no inlinks)';
      case 'unreachable':
        return 'unreachable from the entry pages';
      case 'too-deep':
        return `${f.depth} clicks deep (limit ${f.maxDepth})`;
      case 'few-inlinks':
        return `important page with ${f.contentInlinks} content inlink${f.contentInlinks === 1 ? '' : 's'} (minimum ${f.minInlinks})`;
      case 'rank-below-importance':
        return `PageRank percentile ${pct(f.rankPercentile)} far below importance percentile ${pct(f.importancePercentile)}`;
    }
  });
  const why = parts.length > 0 ? parts.join(', ') : 'related page';
  return `${why}; ${f.anchor === null ? 'no anchor phrase' : ANCHOR_WORDS[f.anchor]}`;
}

function pct(x: number): string {
  return String(Math.round(x * 100));
}
