/**
 * Which mention of a target an author of this site would link: a logistic regression fitted on
 * the site's own content links, each against the unlinked mentions of the same target in the
 * same page (the mentions its author passed over). It learns, per site, whether authors link
 * the first mention or the one that names the thing exactly, code names or words, the title or
 * a section's name, a list entry or running text, and which written forms of code they link
 * (`Error`, not the `error` variable or the `'error'` event, though all three stem alike).
 *
 * A training group is one linked (source, target) pair: its first link whose whole text is one
 * of the target's names is the positive (one per pair, so a pair that links a name twenty times
 * weighs as much as one that links it once), and the pair's unlinked mentions of other names or
 * placements (`MentionHit.anchors`) are the negatives. Every feature is computed as if the pair's own links were absent (the phrase
 * odds leave them out; a name only this source uses is no name). Below
 * {@link MIN_ANCHOR_GROUPS} groups the fixed order of `rankAnchors` is kept.
 */
import { fitLogistic, linearScore } from './logistic.js';
import type { LogisticModel } from './logistic.js';

/** The features of one anchor option, in this order. */
export const ANCHOR_FEATURES = [
  'phrase-odds',
  'placement-rate',
  'phrase-link-rate',
  'anchor-text',
  'title',
  'label',
  'alias',
  'heading',
  'code',
  'alone',
  'first',
  'order',
  'words',
  'quoted',
  'exact-code',
  // Code: the odds of its written form (case kept) being linked to the target. Words have no
  // written form of their own, so for them it repeats phrase-odds, and the two weights share
  // that part between them (read the pair together in the report). Giving words 0 here instead
  // was not measured this round.
  'form-odds',
] as const;

/** Fewer linked pairs with a passed-over mention than this: no fit, the fixed order. */
export const MIN_ANCHOR_GROUPS = 30;
/** At most this many groups are fitted on (every k-th pair in (source, target) order). */
export const MAX_ANCHOR_GROUPS = 5000;
/** L2 penalty of the fit. */
const ANCHOR_L2 = 1;

/** What is known of one anchor option. */
export interface AnchorOptionFacts {
  /** Links to the target whose whole text is the phrase, the pair's own left out. */
  readonly linkedToTarget: number;
  /** Links with the phrase as whole text to any page, the pair's own left out. */
  readonly linked: number;
  /** Occurrences of the phrase on the site (prose and links). */
  readonly total: number;
  /** The site's link rate of the option's placement. */
  readonly placementRate: number;
  /** Index of the best name kind in `anchor-text, title, label, alias, heading`. */
  readonly kind: number;
  /** Placement bits: 1 code, 2 alone on its line. */
  readonly place: number;
  /** Position among the pair's options in the text (0 = first). */
  readonly order: number;
  readonly words: number;
  /** Inline code that is a quoted string (`'stream'`). */
  readonly quoted: boolean;
  /** Inline code written exactly as one of the target's own names, case and all (`Error`, not `error`). */
  readonly exact: boolean;
  /** For inline code: links to the target with this written form (case kept), the pair's own left out; else -1. */
  readonly formLinkedToTarget: number;
  /** For inline code: occurrences of this written form on the site (code mentions and code links). */
  readonly formTotal: number;
}

/** The feature vector of an option. */
export function anchorFeatures(o: AnchorOptionFacts): number[] {
  const kinds = [0, 0, 0, 0, 0];
  if (o.kind >= 0 && o.kind < kinds.length) kinds[o.kind] = 1;
  return [
    Math.log((o.linkedToTarget + 0.5) / (o.total + 1)),
    Math.log(o.placementRate),
    Math.log((o.linked + 0.5) / (o.total + 1)),
    ...kinds,
    o.place & 1 ? 1 : 0,
    o.place & 2 ? 1 : 0,
    o.order === 0 ? 1 : 0,
    Math.log1p(o.order),
    o.words,
    o.quoted ? 1 : 0,
    o.exact ? 1 : 0,
    o.formLinkedToTarget < 0 ? Math.log((o.linkedToTarget + 0.5) / (o.total + 1)) : Math.log((o.formLinkedToTarget + 0.5) / (o.formTotal + 1)),
  ];
}

/** A fitted choice, or null (too few groups: keep the fixed order). */
export interface AnchorChoice {
  readonly model: LogisticModel;
  readonly groups: number;
  readonly options: number;
}

/** One training group: its options, the linked ones marked. */
export interface AnchorGroup {
  readonly options: readonly AnchorOptionFacts[];
  readonly linked: readonly boolean[];
}

/**
 * Fit the choice on the groups (already in a fixed order). Groups without both a linked and a
 * passed-over option teach nothing and are skipped.
 */
export function fitAnchorChoice(groups: readonly AnchorGroup[]): AnchorChoice | null {
  const useful = groups.filter((g) => g.linked.includes(true) && g.linked.includes(false));
  if (useful.length < MIN_ANCHOR_GROUPS) return null;
  const every = Math.ceil(useful.length / MAX_ANCHOR_GROUPS);
  const rows: number[][] = [];
  const labels: number[] = [];
  for (let i = 0; i < useful.length; i += every) {
    const g = useful[i];
    g.options.forEach((o, k) => {
      rows.push(anchorFeatures(o));
      labels.push(g.linked[k] ? 1 : 0);
    });
  }
  const model = fitLogistic(rows, labels, { l2: ANCHOR_L2 });
  if (!model.converged) return null;
  return { model, groups: Math.ceil(useful.length / every), options: rows.length };
}

/** The choice's score of an option (higher: more likely the one an author links). */
export function anchorScore(choice: AnchorChoice, o: AnchorOptionFacts): number {
  return linearScore(choice.model, anchorFeatures(o));
}
