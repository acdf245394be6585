/**
 * Planning the edits of one source file: which of its chosen suggestions can be written, and
 * the text after writing them. Pure.
 *
 * A suggestion is refused (the others in the file still apply) when:
 * - the file's content hash is not the `sourceHash` the suggestion was made for (the file
 *   changed since the report; its offsets may point anywhere now);
 * - the file could not be decoded exactly (binary, too large, invalid UTF-8: writing it back
 *   would change bytes other than the link);
 * - the anchor phrase is not at its offsets;
 * - the anchor overlaps a protected region of the file as it is now (`regions`, from
 *   `parseSource` of the file just read, not from the report): a shortcode, template tag, HTML
 *   tag, front matter, ... (see `ProtectedKind`); the one exception is an anchor that is exactly
 *   an inline code span of the file as read now (`codeSpans`), which the link wraps whole, and
 *   which must read back as a link whose text is that code;
 * - its anchor overlaps one of an earlier suggestion in the file (by offset);
 * - re-parsing the edited text (`parseSource`) does not show a link with that href starting at
 *   the anchor's place, e.g. when the anchor sits where link syntax is not read;
 * - the edited text's protected regions are not those of the original, shifted by the
 *   inserted markup, byte for byte (the edit would have changed syntax next to the anchor), or
 *   a link of the original (href and text) is no longer read.
 * Edits are made from the end of the file backwards, so every offset still refers to the
 * original text; nothing but the link markup is inserted.
 */
import type { ResolvedOptions } from '../config/options.js';
import { buildLineIndex, parseSource, positionOf } from '../parse/index.js';
import { NO_ANCHOR } from './select.js';
import type { CodeSpan, ProtectedRegion, RawLink, SourceFile, Suggestion } from '../types.js';
import { linkMarkup } from './markup.js';
import { changedRegions, overlappingRegion, REGION_WORDS } from './regions.js';
import type { Insertion } from './regions.js';
import type { AppliedLink, FilePlan, LinkStyle, NotApplied, RefusalCode } from './types.js';

/** What planning one file needs. */
export interface PlanInput {
  /** The file as read now. */
  readonly file: SourceFile;
  /** The chosen suggestions in this file, each with an anchor. */
  readonly suggestions: readonly Suggestion[];
  /** The href of each suggestion's link, by id (from `hrefFor`). */
  readonly hrefs: ReadonlyMap<string, string>;
  readonly style: LinkStyle;
  /** For re-parsing the edited text as the analysis would. */
  readonly options: ResolvedOptions;
  /** Protected regions of `file` as read now (`parseSource(file, options).protected`). */
  readonly regions: readonly ProtectedRegion[];
  /** Links of `file` as read now (`parseSource(file, options).links`): each must survive the edit. */
  readonly links: readonly RawLink[];
  /** Inline code spans of `file` as read now (`parseSource(file, options).codeSpans`): an anchor that is exactly one is wrapped whole. */
  readonly codeSpans?: readonly CodeSpan[];
}

/** Source problems that mean the decoded text is not the file's bytes. */
const UNWRITABLE = new Set(['binary', 'too-large', 'invalid-utf8', 'unreadable']);

/** Plan one file's edits. */
export function planFile(input: PlanInput): FilePlan {
  const { file } = input;
  const refused: NotApplied[] = [];
  const refuse = (s: Suggestion, code: RefusalCode, reason: string, extra: Pick<NotApplied, 'kind'> = {}) =>
    refused.push({ id: s.id, file: file.path, code, ...extra, reason });
  const bad = file.problems.find((p) => UNWRITABLE.has(p.code));
  const lines = buildLineIndex(file.text);

  const codeSpans = new Map((input.codeSpans ?? []).map((c) => [`${c.offset}:${c.endOffset}`, c]));
  /** The code regions that anchors wrap whole: the edit moves them inside the new link. */
  const wrapped = new Map<string, { region: ProtectedRegion; span: CodeSpan }>();
  let candidates: Suggestion[] = [];
  for (const s of input.suggestions) {
    if (bad !== undefined) refuse(s, 'undecodable', `cannot be edited without changing other bytes: ${bad.message}`);
    else if (s.sourceHash !== file.hash) {
      refuse(s, 'changed', `the source changed since the report (content hash ${s.sourceHash.slice(0, 12)}, now ${file.hash.slice(0, 12)}); run "linkweave suggest" again`);
    } else if (s.anchor === null || s.anchor === '') refuse(s, 'no-anchor', NO_ANCHOR);
    else if (s.offset < 0 || s.endOffset > file.text.length || file.text.slice(s.offset, s.endOffset) !== s.anchor) {
      refuse(s, 'anchor-moved', `the anchor "${s.anchor}" is not at offset ${s.offset}`);
    } else if (splitsPair(file.text, s.offset) || splitsPair(file.text, s.endOffset)) {
      refuse(s, 'anchor-moved', `the anchor "${s.anchor}" starts or ends inside a character (between the halves of a surrogate pair)`);
    } else if (!input.hrefs.has(s.id)) refuse(s, 'not-a-page', `the target ${s.target} is not a page of the report`);
    else {
      const region = overlappingRegion(input.regions, s.offset, s.endOffset);
      if (region === null) candidates.push(s);
      else if (region[2] === 'code' && region[0] === s.offset && region[1] === s.endOffset && codeSpans.has(`${s.offset}:${s.endOffset}`)) {
        wrapped.set(s.id, { region, span: codeSpans.get(`${s.offset}:${s.endOffset}`)! });
        candidates.push(s);
      } else refuse(s, 'protected', `${REGION_WORDS[region[2]]} (line ${positionOf(lines, region[0]).line})`, { kind: region[2] });
    }
  }
  candidates.sort((a, b) => a.offset - b.offset || a.endOffset - b.endOffset || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const chosen: Suggestion[] = [];
  for (const s of candidates) {
    const last = chosen[chosen.length - 1];
    if (last !== undefined && s.offset < last.endOffset) refuse(s, 'overlap', `its anchor overlaps the anchor of ${last.id} ("${last.anchor}")`);
    else chosen.push(s);
  }
  candidates = chosen;

  // Re-parse and drop what does not read as a link; a drop can change how the rest parses, so
  // repeat until every remaining edit checks out.
  for (;;) {
    const { text, applied } = edit(file.text, candidates, input);
    if (applied.length === 0) return done(file, input.style, applied, refused, file.text);
    const facts = parseSource({ ...file, text }, input.options);
    const failed = applied.filter((a) => {
      const link = facts.links.find((l) => l.href === a.href && l.line === a.line && l.column === a.column);
      const code = wrapped.get(a.id);
      return link === undefined || (code !== undefined && link.text !== code.span.code);
    });
    for (const f of failed) refuse(candidates.find((s) => s.id === f.id)!, 'not-a-link', `a link here would not be read as a link (checked by parsing the edited file)`);
    if (failed.length === 0) {
      // The new links are regions of the edited text themselves (`link`, and `html-tag` for <a>).
      const extents = applied.map((a) => [a.offset, a.offset + a.open.length + a.anchor.length + a.close.length] as const);
      const after = facts.protected.filter((r) => !extents.some(([s, e]) => r[0] >= s && r[1] <= e));
      const kept = new Set(applied.map((a) => wrapped.get(a.id)?.region));
      const before = wrapped.size === 0 ? input.regions : input.regions.filter((r) => !kept.has(r));
      const touched = touchedByChanges(candidates, before, after, insertionsOf(applied));
      for (const s of lostLinkSuggestions(candidates, input.links, facts.links, applied)) if (!touched.includes(s)) touched.push(s);
      if (touched.length === 0) return done(file, input.style, applied, refused, text);
      for (const s of touched) refuse(s, 'region-changed', 'the link would change the template, HTML or other syntax next to it (checked by parsing the edited file)');
      failed.push(...applied.filter((a) => touched.some((s) => s.id === a.id)));
    }
    const gone = new Set(failed.map((f) => f.id));
    candidates = candidates.filter((s) => !gone.has(s.id));
  }
}

/** The inserted markup of `applied` as insertions at original offsets, ascending. */
function insertionsOf(applied: readonly AppliedLink[]): Insertion[] {
  const out: Insertion[] = [];
  let shift = 0;
  for (const a of applied) {
    const start = a.offset - shift;
    out.push({ at: start, length: a.open.length });
    out.push({ at: start + a.anchor.length, length: a.close.length });
    shift += a.open.length + a.close.length;
  }
  return out;
}

/**
 * The suggestions whose anchor touches (overlaps or borders) a region that the edit did not keep
 * byte for byte; all of them when a change touches none (nothing may go out unchecked).
 */
function touchedByChanges(
  candidates: readonly Suggestion[],
  before: readonly ProtectedRegion[],
  after: readonly ProtectedRegion[],
  insertions: readonly Insertion[],
): Suggestion[] {
  const changed = changedRegions(before, after, insertions);
  if (changed.length === 0) return [];
  const touched = candidates.filter((s) => changed.some(([a, b]) => a <= s.endOffset && b >= s.offset));
  return touched.length > 0 ? touched : [...candidates];
}

/**
 * Suggestions to blame when a link of the original (by href and text) is not read in the edited
 * text any more: those on the line of a lost link, or all when none is.
 */
function lostLinkSuggestions(
  candidates: readonly Suggestion[],
  before: readonly RawLink[],
  after: readonly RawLink[],
  applied: readonly AppliedLink[],
): Suggestion[] {
  const key = (href: string, text: string) => `${href}\u0000${text.replace(/\s+/g, ' ').trim()}`;
  const left = new Map<string, number>();
  for (const l of after) left.set(key(l.href, l.text), (left.get(key(l.href, l.text)) ?? 0) + 1);
  for (const a of applied) left.set(key(a.href, a.anchor), (left.get(key(a.href, a.anchor)) ?? 0) - 1);
  const lost: RawLink[] = [];
  for (const l of before) {
    const k = key(l.href, l.text);
    const n = left.get(k) ?? 0;
    if (n > 0) left.set(k, n - 1);
    else lost.push(l);
  }
  if (lost.length === 0) return [];
  const onLine = candidates.filter((s) => lost.some((l) => l.line === s.line));
  return onLine.length > 0 ? onLine : [...candidates];
}

/** True when `offset` falls between a high and a low surrogate (inserting there would break the character). */
function splitsPair(text: string, offset: number): boolean {
  if (offset <= 0 || offset >= text.length) return false;
  const before = text.charCodeAt(offset - 1);
  const after = text.charCodeAt(offset);
  return before >= 0xd800 && before <= 0xdbff && after >= 0xdc00 && after <= 0xdfff;
}

/** Insert the markup of `sorted` (ascending, not overlapping) into `text`. */
function edit(text: string, sorted: readonly Suggestion[], input: PlanInput): { text: string; applied: AppliedLink[] } {
  const parts: string[] = [];
  let at = text.length;
  for (let i = sorted.length - 1; i >= 0; i--) {
    const s = sorted[i];
    const { open, close } = linkMarkup(input.file.kind, input.hrefs.get(s.id)!);
    parts.push(text.slice(s.endOffset, at), close, text.slice(s.offset, s.endOffset), open);
    at = s.offset;
  }
  parts.push(text.slice(0, at));
  const edited = parts.reverse().join('');
  const lines = buildLineIndex(edited);
  let shift = 0;
  const applied = sorted.map((s): AppliedLink => {
    const href = input.hrefs.get(s.id)!;
    const { open, close } = linkMarkup(input.file.kind, href);
    const offset = s.offset + shift;
    shift += open.length + close.length;
    const { line, column } = positionOf(lines, offset);
    return { id: s.id, file: input.file.path, line, column, anchor: s.anchor!, target: s.target, href, open, close, offset };
  });
  return { text: edited, applied };
}

function done(file: SourceFile, style: LinkStyle, applied: AppliedLink[], refused: NotApplied[], after: string): FilePlan {
  return { file: file.path, before: file.text, after, style, applied, refused: refused.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)) };
}
