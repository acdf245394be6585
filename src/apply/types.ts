/** Types of the apply stage: link styles, and what planning one file's edits gives. */
import type { ProtectedKind } from '../types.js';
import type { LinkStyle } from '../routes/index.js';

export { LINK_STYLES } from '../routes/index.js';
export type { LinkSource, LinkStyle, LinkTarget } from '../routes/index.js';

/** Internal links of each style, counted in one file or a whole site. */
export type StyleCounts = Readonly<Record<LinkStyle, number>>;

/** A link `planFile` inserted. */
export interface AppliedLink {
  readonly id: string;
  readonly file: string;
  /** Position of the new link's first character in the edited file (1-based). */
  readonly line: number;
  readonly column: number;
  readonly anchor: string;
  readonly target: string;
  readonly href: string;
  /** The inserted markup before and after the anchor (`[` and `](href)`). */
  readonly open: string;
  readonly close: string;
  /** UTF-16 offset of `open` in the edited text. */
  readonly offset: number;
}

/**
 * Why a suggestion was not applied:
 * - `no-anchor`: it has no anchor phrase (a sentence must be written by hand);
 * - `bad-path`: its file is not a source file under the content root;
 * - `unreadable`: the file is missing or cannot be read;
 * - `undecodable`: the file cannot be written back without changing other bytes;
 * - `changed`: the file's content hash is not the report's;
 * - `anchor-moved`: the anchor phrase is not at its offsets (or splits a character);
 * - `not-a-page`: the target is not a page of the report;
 * - `protected`: the anchor overlaps a protected region of the file as it is now (`kind` says which);
 * - `overlap`: the anchor overlaps the anchor of another chosen suggestion;
 * - `not-a-link`: the edited file would not read the markup as a link there;
 * - `region-changed`: the edit would change a protected region next to the anchor;
 * - `write-failed`: the file could not be written.
 */
export type RefusalCode =
  | 'no-anchor'
  | 'bad-path'
  | 'unreadable'
  | 'undecodable'
  | 'changed'
  | 'anchor-moved'
  | 'not-a-page'
  | 'protected'
  | 'overlap'
  | 'not-a-link'
  | 'region-changed'
  | 'write-failed';

/** A suggestion not applied, and why. */
export interface NotApplied {
  readonly id: string;
  readonly file: string;
  readonly code: RefusalCode;
  /** For `protected`: the kind of region the anchor lies in. */
  readonly kind?: ProtectedKind;
  /** The reason in plain words. */
  readonly reason: string;
}

/** One source file's edits. */
export interface FilePlan {
  readonly file: string;
  /** Text before and after (decoded, as `SourceFile.text`). Equal when nothing was applied. */
  readonly before: string;
  readonly after: string;
  readonly style: LinkStyle;
  readonly applied: readonly AppliedLink[];
  readonly refused: readonly NotApplied[];
}
