/**
 * The site's names for its pages, and where the prose mentions them (the candidate source and
 * the name evidence of the link model, after Milne and Witten, "Learning to link with
 * Wikipedia", CIKM 2008, and Gerlach et al., CIKM 2021: a dictionary of names built from the
 * site's own links, matched on the longest n-grams of the text).
 *
 * A page's names: its title, its aliases (the words of the last segment of its route and of its
 * frontmatter aliases), the labels its template links carry (a sidebar's words for it), and the
 * anchor texts of the content links other pages already point at it with. Names are compared
 * on Porter stems (the text stage's tokenizer), so "Caching tiles" matches "cached tile", with
 * stop words between two words only where a name has some ("storage for tiles" is "Storage of
 * tiles", "npm from installing" is not "npm install"). A code name a heading gives (`server.close()`)
 * is a mention in prose only where it is written as the name is ("the server is closed" is none).
 *
 * Each distinct name (a phrase) counts its occurrences over the site: in prose, and as the whole
 * text of a content link (to which page). From those come a phrase's link probability (the
 * share of its occurrences that are links) and its commonness for a page (the share of its links
 * that point there). A phrase that names more than {@link MAX_PAGES_PER_NAME} pages is too
 * ambiguous to be a name and is left out.
 *
 * Built in one pass over every page's prose through a trie of the phrases, so the cost is the
 * number of words times the length of the longest match, never pages times names.
 */
import { ProseTokens, proseTokens, proseWords } from './mention-tokens.js';
import type { CodeSpan, PageFacts, SiteGraph } from '../types.js';
import { forEachWord, isStopWord, stemToken, tokenize } from '../text/tokenize.js';
import type { StemCache } from '../text/tokenize.js';
import { positionInSpan } from './anchor.js';
import type { AnchorMatch, SourceTokens } from './anchor.js';
import { routeSegmentText, routeWords } from './names.js';
import { anchorScore, fitAnchorChoice } from './anchor-choice.js';
import type { AnchorChoice, AnchorGroup, AnchorOptionFacts } from './anchor-choice.js';

/** Where a name comes from. */
export type NameKind = 'title' | 'alias' | 'label' | 'anchor-text' | 'heading';

/** A phrase that names more pages than this is left out of the dictionary. */
export const MAX_PAGES_PER_NAME = 8;
/** Longest name, in kept words. */
export const MAX_NAME_WORDS = 8;
/** Anchor options kept per (source, target) pair (each the first mention of its phrase and placement). */
export const MENTIONS_KEPT = 8;

/**
 * Where a mention or a link sits, as a number: bit 1 set when it is inline code, bit 2 set when
 * it is alone on its line (a list of links, "See also" entries). Authors link some placements far
 * more than others, and sites differ: an API reference links its code names in running text, a
 * guide links a command in a list at the end and leaves the same name in code unlinked above.
 */
export type Placement = 0 | 1 | 2 | 3;
const CODE = 1 as const;
const ALONE = 2 as const;

/** How often the site links each placement: content links and unlinked mentions of page names, by {@link Placement}. */
export interface PlacementHabit {
  readonly linked: [number, number, number, number];
  readonly mentioned: [number, number, number, number];
}

/** The share of a placement's occurrences that are links, with one link and one mention added (so an unseen placement is 1/2). */
export function placementRate(habit: PlacementHabit, place: number): number {
  return (habit.linked[place] + 1) / (habit.linked[place] + habit.mentioned[place] + 2);
}

/** One page's claim on a phrase. */
export interface NameRef {
  readonly target: number;
  readonly kind: NameKind;
  /** For anchor texts: source page -> number of its content links to the target with this text. */
  readonly users: Map<number, number> | null;
}

/** A distinct name, with its counts over the site. */
export interface Phrase {
  readonly stems: readonly string[];
  readonly names: NameRef[];
  /** Occurrences in prose. */
  prose: number;
  /** Content links whose whole text is this phrase. */
  linked: number;
  /** Of those, per target page. */
  readonly linkedTo: Map<number, number>;
}

/** Where a source mentions one target. */
export interface MentionHit {
  /** Mentions of any of the target's names (sub-phrases of a longer match count too). */
  count: number;
  /** Distinct phrases matched. */
  readonly phrases: number[];
  /**
   * Anchor options: the first mention of each distinct phrase (at most {@link MENTIONS_KEPT},
   * not overlapping), best first once `rankAnchors` has run.
   */
  readonly anchors: AnchorMatch[];
  /** The phrase of each anchor option. */
  readonly anchorPhrases: number[];
  /** The placement of each anchor option. */
  readonly anchorPlaces: Placement[];
}

/** The dictionary and the mentions found. */
export interface MentionIndex {
  readonly phrases: readonly Phrase[];
  /** Per source page id: target -> the source's mentions of it. */
  readonly bySource: readonly Map<number, MentionHit>[];
  /** Per source page id: the phrases found in the texts of its content links to pages. */
  readonly linkMatches: readonly (readonly LinkTextMatch[])[];
  /** How often the site links each placement (which anchor options come first). */
  readonly placement: PlacementHabit;
  /** The fitted choice among a pair's anchor options, or null (too few links: the fixed order). */
  readonly anchorChoice: AnchorChoice | null;
  /** Inline code by written form: how often each is written and linked (an option's form odds). */
  readonly codeForms: CodeForms;
}

/** A phrase found in the text of a content link. */
export interface LinkTextMatch {
  /** The page the link points to. */
  readonly target: number;
  readonly phrase: number;
  /** The phrase is the link's whole text. */
  readonly exact: boolean;
}

/** A distinct link text, tokenised and looked up once. */
interface LinkText {
  readonly stems: string[];
  /** Its phrase, or -1 (no kept word, or longer than a name). */
  readonly phrase: number;
  /** Its written form (`codeKey`), '' when it has no phrase. */
  readonly key: string;
  /** Where stop words stand between its kept words ({@link stopMask}). */
  readonly stops: number;
  /** Its written form with case kept, once a code link has asked. */
  cased: string | null;
  /** The phrases its stems hold (phrase, 1 when the whole text), once the trie is built. */
  matches: number[] | null;
}

interface TrieNode {
  phrase: number;
  readonly next: Map<string, TrieNode>;
}

/**
 * Build the name dictionary and find every mention in the prose of every page.
 * @param factsOf facts by page id (spans give the prose)
 */
export function buildMentionIndex(graph: SiteGraph, factsOf: (page: number) => PageFacts | undefined, cache: StemCache): MentionIndex {
  const n = graph.pages.length;
  const phrases: Phrase[] = [];
  const byKey = new Map<string, number>();
  const phraseOf = (stems: readonly string[]): number => {
    const key = stems.join(' ');
    let id = byKey.get(key);
    if (id === undefined) {
      id = phrases.length;
      phrases.push({ stems, names: [], prose: 0, linked: 0, linkedTo: new Map() });
      byKey.set(key, id);
    }
    return id;
  };
  // Inline code is compared as written (see codeKey): written form -> the phrases of the names
  // written so.
  const byCode = new Map<string, number>();
  const keyOf = new Map<string, string>();
  // Per phrase: its names as written (codeKey), each with the pages it names. Stems join words
  // that are different names ("HTTPS" and "HTTP/2" both stem to "http"): a mention written
  // exactly as some of the phrase's pages are named is a mention of those pages only.
  const written = new Map<number, Map<string, Set<number>>>();
  // The pages' own names (title, route, code-naming headings) as written, case kept: key -> pages.
  const cased = new Map<string, Set<number>>();
  // Per phrase: the written forms (codeKey) of the code names headings give it, each with its
  // pages. A code name matches prose only as written: `server.close()` is not "the server is
  // closed", though the stems are the same.
  const headingAs = new Map<number, Map<string, Set<number>>>();
  const ownName = (as: string, page: number): void => {
    const key = codeKey(as, true);
    if (key === '') return;
    const pages = cased.get(key);
    if (pages === undefined) cased.set(key, new Set([page]));
    else pages.add(page);
  };
  // The last part of the dotted code names of a page's headings (`AssertionError` of
  // `assert.AssertionError`), case kept: key -> pages. Code a page writes so is the page
  // speaking of its own member, as with `cased`; kept apart from `cased`, which also says what
  // a target is named exactly.
  const members = new Map<string, Set<number>>();
  const ownMember = (as: string, page: number): void => {
    const key = codeKey(as, true);
    if (key === '') return;
    const pages = members.get(key);
    if (pages === undefined) members.set(key, new Set([page]));
    else pages.add(page);
  };
  const refOf: (Map<number, NameRef> | undefined)[] = [];
  // Per phrase: where its names written out have stop words between their kept words (each a
  // stopMask). Prose matches a phrase only with stop words where one of its names has them:
  // "npm from installing" is not the name "npm install", though the stems are the same.
  const stopsOf: (Set<number> | undefined)[] = [];
  const allowStops = (id: number, mask: number): void => void (stopsOf[id] ??= new Set()).add(mask);
  /** Claim the phrase of `stems` for `target`; its id, or -1 when it is no name (no word, or too long). */
  const claim = (stems: readonly string[], target: number, kind: NameKind, source = -1, as: string | null = null): number => {
    if (stems.length === 0 || stems.length > MAX_NAME_WORDS) return -1;
    const id = phraseOf(stems);
    claimPhrase(id, target, kind, source, as === null ? null : keyOfText(as, id));
    allowStops(id, as === null ? 0 : stopMask(as, cache));
    return id;
  };
  /** The written form (codeKey) of a name's text, its first phrase noted for code spans written so. */
  const keyOfText = (as: string, id: number): string => {
    let key = keyOf.get(as);
    if (key === undefined) {
      key = codeKey(as);
      keyOf.set(as, key);
      if (key !== '' && !byCode.has(key)) byCode.set(key, id);
    }
    return key;
  };
  /** Claim phrase `id` for `target` (`key`: the name's written form, or null). */
  const claimPhrase = (id: number, target: number, kind: NameKind, source: number, key: string | null): void => {
    const phrase = phrases[id];
    if (key !== null) {
      if (key !== '') {
        let forms = written.get(id);
        if (forms === undefined) written.set(id, (forms = new Map()));
        const pages = forms.get(key);
        if (pages === undefined) forms.set(key, new Set([target]));
        else pages.add(target);
      }
    }
    // Found through a map, not a search of the phrase's names: a label or link text such as
    // "Overview" can name thousands of pages, and a search per claim made that quadratic.
    // Keyed per phrase, so the key stays a small integer on any site.
    const refs = (refOf[id] ??= new Map());
    const refKey = target * KIND_ORDER.length + KIND_ORDER.indexOf(kind);
    let ref = refs.get(refKey);
    if (ref === undefined) {
      ref = { target, kind, users: kind === 'anchor-text' ? new Map() : null };
      phrase.names.push(ref);
      refs.set(refKey, ref);
    }
    if (ref.users !== null && source >= 0) ref.users.set(source, (ref.users.get(source) ?? 0) + 1);
  };

  for (const page of graph.pages) {
    claim(tokenize(page.title, cache), page.id, 'title', -1, page.title);
    ownName(page.title, page.id);
    for (const route of [page.route, ...page.meta.aliases]) {
      // A route whose words the tokenizer partly drops names nothing (`/n-api/` is not "API").
      const words = routeWords(route, cache);
      const segment = routeSegmentText(route);
      if (codeKey(segment).split(' ').length === words.length) claim(words, page.id, 'alias', -1, segment);
      ownName(segment, page.id);
    }
    for (const h of factsOf(page.id)?.headings ?? []) {
      if (h.depth < 2) continue;
      for (const name of headingNames(h.text)) {
        const id = claim(tokenize(name, cache), page.id, 'heading', -1, name);
        ownName(name, page.id);
        // The member's own name (`AssertionError` of `assert.AssertionError`) is the page's too.
        const member = MEMBER.exec(name);
        if (member !== null) ownMember(member[1], page.id);
        if (id < 0) continue;
        let forms = headingAs.get(id);
        if (forms === undefined) headingAs.set(id, (forms = new Map()));
        const key = codeKey(name);
        const pages = forms.get(key);
        if (pages === undefined) forms.set(key, new Set([page.id]));
        else pages.add(page.id);
      }
    }
  }
  // Per source: the code it links, by written form (case kept; quoted strings aside), with the
  // pages it links each to. Code a page links to one page (`TypeError` to the exceptions page)
  // means that page wherever the page writes it, and is no mention of another page named so.
  // Quoted strings are left out: an API reference links "`'close'`" to a different class's
  // event in each section.
  const linkedForms = new Map<number, Map<string, Set<number>>>();
  const contentLinks: { from: number; to: number; text: LinkText; line: number; column: number; code: boolean; quoted: boolean; exact: boolean; form: string }[] = [];
  // Inline code by written form (codeKey, case kept): occurrences, and links per target.
  const forms: CodeForms = { total: new Map(), linkedTo: new Map() };
  // Link texts repeat (a site links a page by the same few words from many pages): each distinct
  // text is tokenised, looked up and keyed once. At 10,000 generated pages this was a third of
  // the dictionary's cost.
  const texts = new Map<string, LinkText>();
  for (const link of graph.links) {
    if (link.from < 0 || link.to < 0 || link.from === link.to) continue;
    const raw = link.raw.text;
    let text = texts.get(raw);
    if (text === undefined) {
      const stems = tokenize(raw, cache);
      const phrase = stems.length === 0 || stems.length > MAX_NAME_WORDS ? -1 : phraseOf(stems);
      text = { stems, phrase, key: phrase < 0 ? '' : keyOfText(raw, phrase), stops: stopMask(raw, cache), cased: null, matches: null };
      texts.set(raw, text);
    }
    if (link.context === 'content') {
      if (text.phrase >= 0) {
        claimPhrase(text.phrase, link.to, 'anchor-text', link.from, text.key);
        allowStops(text.phrase, text.stops);
      }
      const form = link.raw.code === true ? (text.cased ??= codeKey(raw, true)) : '';
      const quoted = link.raw.code === true && QUOTED.test(raw);
      contentLinks.push({ from: link.from, to: link.to, text, line: link.raw.line, column: link.raw.column, code: link.raw.code === true, quoted, exact: link.raw.code === true && cased.get(form)?.has(link.to) === true, form });
      if (form !== '' && !quoted) {
        let mine = linkedForms.get(link.from);
        if (mine === undefined) linkedForms.set(link.from, (mine = new Map()));
        const to = mine.get(form);
        if (to === undefined) mine.set(form, new Set([link.to]));
        else to.add(link.to);
      }
    } else if (text.phrase >= 0) {
      claimPhrase(text.phrase, link.to, 'label', -1, text.key);
      allowStops(text.phrase, text.stops);
    }
  }
  // The trie of unambiguous phrases.
  const root: TrieNode = { phrase: -1, next: new Map() };
  phrases.forEach((p, id) => {
    const targets = new Set(p.names.map((r) => r.target));
    if (targets.size === 0 || targets.size > MAX_PAGES_PER_NAME) return;
    let node = root;
    for (const stem of p.stems) {
      let child = node.next.get(stem);
      if (child === undefined) {
        child = { phrase: -1, next: new Map() };
        node.next.set(stem, child);
      }
      node = child;
    }
    node.phrase = id;
  });

  // Link texts: a whole-text match is a linked occurrence; a match inside a longer text is an
  // occurrence that is not a link (of that phrase).
  const linkMatches: LinkTextMatch[][] = Array.from({ length: n }, () => []);
  const habit: PlacementHabit = { linked: [0, 0, 0, 0], mentioned: [0, 0, 0, 0] };
  const lines: (LineCounts | null)[] = new Array<LineCounts | null>(n).fill(null);
  const linesOf = (page: number): LineCounts => (lines[page] ??= lineCounts(factsOf(page)));
  // Per linked pair (source * n + target): its links whose whole text is a phrase.
  const pairLinks = new Map<number, LinkedOption[]>();
  for (const link of contentLinks) {
    const { stems } = link.text;
    const exact = link.text.phrase < 0 ? undefined : link.text.phrase;
    const on = linesOf(link.from);
    const alone = on.markdown && !on.words.has(link.line) && !on.code.has(link.line) && on.links.get(link.line) === 1;
    const place: Placement = ((link.code ? CODE : 0) | (alone ? ALONE : 0)) as Placement;
    if (exact !== undefined) {
      const key = link.from * n + link.to;
      let own = pairLinks.get(key);
      if (own === undefined) {
        own = [];
        pairLinks.set(key, own);
      }
      own.push({ phrase: exact, place, line: link.line, column: link.column, words: stems.length, quoted: link.quoted, exact: link.exact, form: link.form });
      if (link.form !== '') {
        forms.total.set(link.form, (forms.total.get(link.form) ?? 0) + 1);
        let to = forms.linkedTo.get(link.form);
        if (to === undefined) forms.linkedTo.set(link.form, (to = new Map()));
        to.set(link.to, (to.get(link.to) ?? 0) + 1);
      }
      const p = phrases[exact];
      p.linked++;
      p.linkedTo.set(link.to, (p.linkedTo.get(link.to) ?? 0) + 1);
      habit.linked[place]++;
    }
    if (link.text.matches === null) {
      const found: number[] = [];
      scanStems(stems, stems.map(() => true), root, null, null, (phraseId, _first, words) => void found.push(phraseId, words === stems.length ? 1 : 0));
      link.text.matches = found;
    }
    const found = link.text.matches;
    for (let k = 0; k < found.length; k += 2) {
      const whole = found[k + 1] === 1;
      if (!whole) phrases[found[k]].prose++;
      linkMatches[link.from].push({ target: link.to, phrase: found[k], exact: whole });
    }
  }

  const bySource: Map<number, MentionHit>[] = [];
  const wordTable = proseWords(cache);
  const tokens = new ProseTokens();
  // Per word of the table: the trie node its stem starts at (null: no name starts with it),
  // found once per distinct word. Most words of the prose start no name, and this makes each
  // of them an array read instead of a map lookup by its stem.
  const startOfWord: (TrieNode | null | undefined)[] = [];
  const firstNode = (i: number): TrieNode | undefined => {
    const id = tokens.word[i];
    let node = startOfWord[id];
    if (node === undefined) {
      node = root.next.get(tokens.stem[i]) ?? null;
      startOfWord[id] = node;
    }
    return node ?? undefined;
  };
  /** Whether prose words `first`.. (`words` of them) may be phrase `id`, by where stop words stand between them. */
  const stopsAllowed = (id: number, first: number, words: number): boolean => {
    const allowed = stopsOf[id];
    if (allowed === undefined) return true;
    let mask = 0;
    for (let k = 0; k < words - 1; k++) if (tokens.stopBetween[first + k]) mask |= 1 << k;
    return allowed.has(mask);
  };
  const counted: number[] = [];
  for (let s = 0; s < n; s++) {
    const facts = factsOf(s);
    const hits = new Map<number, MentionHit>();
    bySource.push(hits);
    if (facts === undefined) continue;
    // Mentions in prose and whole inline code spans, in the order of the text (the first
    // mention of a phrase is its anchor option).
    const found: { offset: number; phrase: number; place: Placement; text: () => string; anchor: () => AnchorMatch }[] = [];
    const on = linesOf(s);
    if (facts.spans.length > 0) {
      proseTokens(facts.spans, wordTable, tokens);
      scanStems(tokens.stem, tokens.joinNext, root, firstNode, stopsAllowed, (phraseId, first, words) => {
        const span = facts.spans[tokens.span[first]];
        const start = tokens.start[first];
        const end = tokens.end[first + words - 1];
        const alone = on.markdown && on.words.get(span.line) === 1 && !on.code.has(span.line) && !on.links.has(span.line) && !WORD.test(span.text.slice(0, start) + span.text.slice(end));
        found.push({ offset: span.offset + start, phrase: phraseId, place: alone ? ALONE : 0, text: () => span.text.slice(start, end), anchor: () => match(span, start, end, words) });
      });
    }
    const prose = found.length;
    for (const code of facts.codeSpans ?? []) {
      const phraseId = codeMatchOf(code.code, byCode, root, cache);
      if (phraseId < 0) continue;
      const alone = on.markdown && !on.words.has(code.line) && on.code.get(code.line) === 1 && !on.links.has(code.line);
      const form = codeKey(code.code, true);
      if (form !== '') forms.total.set(form, (forms.total.get(form) ?? 0) + 1);
      found.push({ offset: code.offset, phrase: phraseId, place: alone ? 3 : CODE, text: () => code.code, anchor: () => codeMatch(code, phrases[phraseId].stems.length) });
    }
    if (found.length > prose) found.sort((a, b) => a.offset - b.offset);
    for (const f of found) {
      const phrase = phrases[f.phrase];
      phrase.prose++;
      habit.mentioned[f.place]++;
      // Code written exactly as the source names itself (`response.finished` in the page whose
      // section it is) is the page speaking of itself, not of another page named so: no mention
      // of a target. It still counts above as an occurrence of the phrase and of its placement
      // (the site wrote the name there and did not link it), as in the measured rule.
      const form = (f.place & CODE) !== 0 ? codeKey(f.text(), true) : '';
      if (form !== '' && (cased.get(form)?.has(s) === true || members.get(form)?.has(s) === true)) continue;
      const linkedAs = form === '' ? undefined : linkedForms.get(s)?.get(form);
      let made: AnchorMatch | null = null;
      // A target named by the phrase in several ways (title, route, link text) is still
      // mentioned once here.
      counted.length = 0;
      const writtenAs = written.get(f.phrase);
      const as = writtenAs !== undefined && writtenAs.size > 1 ? codeKey(f.text()) : null;
      const only = as === null ? undefined : writtenAs?.get(as);
      const headingForms = (f.place & CODE) === 0 ? headingAs.get(f.phrase) : undefined;
      const headingPages = headingForms === undefined ? undefined : (headingForms.get(as ?? codeKey(f.text())) ?? NO_PAGES);
      for (const ref of phrase.names) {
        if (ref.target === s || (only !== undefined && !only.has(ref.target))) continue;
        if (ref.kind === 'heading' && headingPages !== undefined && !headingPages.has(ref.target)) continue;
        if (linkedAs !== undefined && !linkedAs.has(ref.target)) continue;
        let hit = hits.get(ref.target);
        if (hit === undefined) {
          hit = { count: 0, phrases: [], anchors: [], anchorPhrases: [], anchorPlaces: [] };
          hits.set(ref.target, hit);
        }
        if (!counted.includes(ref.target)) {
          counted.push(ref.target);
          hit.count++;
        }
        if (!hit.phrases.includes(f.phrase)) hit.phrases.push(f.phrase);
        made ??= f.anchor();
        keepAnchor(hit, f.phrase, f.place, made);
      }
    }
  }
  const choice = orderAnchors(phrases, bySource, pairLinks, habit, cased, forms);
  return { phrases, bySource, linkMatches, placement: habit, anchorChoice: choice, codeForms: forms };
}

/**
 * Fit the anchor choice on the site's linked pairs (`anchor-choice.ts`) and order every pair's
 * anchor options by it (by the fixed order alone when there is no fit).
 * @param pairLinks per linked pair (source * n + target), its links whose whole text is a phrase
 */
function orderAnchors(phrases: readonly Phrase[], bySource: readonly Map<number, MentionHit>[], pairLinks: ReadonlyMap<number, readonly LinkedOption[]>, habit: PlacementHabit, cased: ReadonlyMap<string, ReadonlySet<number>>, forms: CodeForms): AnchorChoice | null {
  const n = bySource.length;
  /** An option's facts as if the pair's own links were absent; null when it names the target only through them. */
  const facts = (s: number, t: number, phraseId: number, place: number, words: number, quoted: boolean, exact: boolean, order: number, form: string): AnchorOptionFacts | null => {
    const p = phrases[phraseId];
    let kind = KIND_ORDER.length;
    for (const k of nameKindsFor(p, s, t)) kind = Math.min(kind, KIND_ORDER.indexOf(k));
    if (kind === KIND_ORDER.length) return null;
    let mine = 0;
    let mineAsForm = 0;
    for (const l of pairLinks.get(s * n + t) ?? []) {
      if (l.phrase === phraseId) mine++;
      if (form !== '' && l.form === form) mineAsForm++;
    }
    const formLinkedToTarget = form === '' ? -1 : (forms.linkedTo.get(form)?.get(t) ?? 0) - mineAsForm;
    return { linkedToTarget: (p.linkedTo.get(t) ?? 0) - mine, linked: p.linked - mine, total: p.prose + p.linked, placementRate: placementRate(habit, place), kind, place, order, words, quoted, exact, formLinkedToTarget, formTotal: forms.total.get(form) ?? 0 };
  };
  const quotedCode = (a: AnchorMatch): boolean => a.kind === 'code' && QUOTED.test(a.text);
  const exactCode = (a: AnchorMatch, t: number): boolean => a.kind === 'code' && cased.get(codeKey(a.text.replace(/<[^>]*>/g, ''), true))?.has(t) === true;
  const formOf = (a: AnchorMatch): string => (a.kind === 'code' ? codeKey(a.text.replace(/<[^>]*>/g, ''), true) : '');

  // Training: a linked phrase and placement stands where its first occurrence is (an unlinked
  // one before the link, if any), because a suggestion can only name the first: so the fit
  // learns which phrase and placement authors link, at the positions it will score.
  const groups: AnchorGroup[] = [];
  for (const key of [...pairLinks.keys()].sort((a, b) => a - b)) {
    const s = Math.floor(key / n);
    const t = key - s * n;
    const hit = bySource[s].get(t);
    // No unlinked mention: nothing was passed over, the pair teaches nothing.
    if (hit === undefined || hit.anchors.length === 0) continue;
    const links = pairLinks.get(key) ?? [];
    const options: { at: { line: number; column: number }; make: (order: number) => AnchorOptionFacts | null; linked: boolean }[] = [];
    const seen = new Set<number>();
    for (const l of links) {
      if (seen.has(l.phrase * 4 + l.place)) continue;
      seen.add(l.phrase * 4 + l.place);
      let at: { line: number; column: number } = l;
      hit.anchors.forEach((a, k) => {
        if (hit.anchorPhrases[k] === l.phrase && hit.anchorPlaces[k] === l.place && before(a, at)) at = a;
      });
      options.push({ at, make: (order) => facts(s, t, l.phrase, l.place, l.words, l.quoted, l.exact, order, l.form), linked: true });
    }
    hit.anchors.forEach((a, k) => {
      if (seen.has(hit.anchorPhrases[k] * 4 + hit.anchorPlaces[k])) return;
      options.push({ at: a, make: (order) => facts(s, t, hit.anchorPhrases[k], hit.anchorPlaces[k], a.words, quotedCode(a), exactCode(a, t), order, formOf(a)), linked: false });
    });
    const order = ranksInText(options.map((o) => o.at));
    const made = options.map((o, k) => o.make(order[k]));
    // One positive per pair, its first linked option: a suggestion names one mention, and a pair
    // that links a name twenty times would otherwise outweigh twenty pairs that link it once.
    let firstLinked = -1;
    for (let k = 0; k < options.length; k++) if (options[k].linked && made[k] !== null && (firstLinked < 0 || order[k] < order[firstLinked])) firstLinked = k;
    const keep = made.map((_, k) => k).filter((k) => made[k] !== null && (!options[k].linked || k === firstLinked));
    groups.push({ options: keep.map((k) => made[k] as AnchorOptionFacts), linked: keep.map((k) => options[k].linked) });
  }
  const choice = fitAnchorChoice(groups);
  for (let s = 0; s < n; s++) {
    for (const [t, hit] of bySource[s]) {
      let scores: number[] | null = null;
      if (choice !== null && hit.anchors.length > 1) {
        const order = ranksInText(hit.anchors);
        scores = hit.anchors.map((a, k) => {
          const f = facts(s, t, hit.anchorPhrases[k], hit.anchorPlaces[k], a.words, quotedCode(a), exactCode(a, t), order[k], formOf(a));
          return f === null ? -Infinity : anchorScore(choice, f);
        });
      }
      rankAnchors(hit, phrases, t, habit, scores);
    }
  }
  return choice;
}

function before(a: { line: number; column: number }, b: { line: number; column: number }): boolean {
  return a.line < b.line || (a.line === b.line && a.column < b.column);
}

/** Each place's rank in the text (0 = first). */
function ranksInText(at: readonly { line: number; column: number }[]): number[] {
  const ranks = new Array<number>(at.length);
  at.map((_, k) => k)
    .sort((a, b) => at[a].line - at[b].line || at[a].column - at[b].column || a - b)
    .forEach((k, rank) => (ranks[k] = rank));
  return ranks;
}

/**
 * Inline code by written form (`codeKey` with case kept): its occurrences on the site (code
 * spans in prose and code links), and its links per target. Authors of one site link `Error` and
 * leave `error` (a variable) or `'error'` (an event name) alone, though all three are the same
 * stems: the written form's own link record tells them apart.
 */
export interface CodeForms {
  readonly total: Map<string, number>;
  readonly linkedTo: Map<string, Map<number, number>>;
}

/** A content link whose whole text is a phrase, as an anchor option of its pair. */
interface LinkedOption {
  readonly phrase: number;
  readonly place: Placement;
  readonly line: number;
  readonly column: number;
  readonly words: number;
  readonly quoted: boolean;
  readonly exact: boolean;
  /** The written form of a code link (`codeKey`, case kept), '' for words. */
  readonly form: string;
}

/** Inline code that is a quoted string: `'stream'`, `"exports"`. */
const QUOTED = /^[`\s]*['"]/;

const NO_PAGES: ReadonlySet<number> = new Set();

/** The last part of a dotted code name, without a call: `assert.AssertionError`, `fs.promises.readFile`. */
const MEMBER = /^[\p{L}\p{N}$_.]*\.([\p{L}$_][\p{L}\p{N}$_]*)$/u;

const KIND_ORDER: readonly NameKind[] = ['anchor-text', 'title', 'label', 'alias', 'heading'];
/** Added to a phrase's link odds, so that names never written as links still rank by placement. */
const PHRASE_PRIOR = 0.05;

/**
 * Order a pair's anchor options the way an author of this site would pick: by the odds that the
 * phrase is written as a link to this target where it occurs (links to the target / occurrences,
 * plus a small prior so unlinked names still compare) times the share of its placement that the
 * site links ({@link placementRate}); then the kind of name (another page's anchor text, the
 * title, a navigation label, the route's words), then the longer phrase, then the earlier place.
 */
function rankAnchors(hit: MentionHit, phrases: readonly Phrase[], target: number, habit: PlacementHabit, scores: readonly number[] | null): void {
  const order = hit.anchors.map((_, k) => k);
  const odds = (k: number): number => {
    const p = phrases[hit.anchorPhrases[k]];
    const place = hit.anchorPlaces[k];
    const total = p.prose + p.linked;
    const phraseOdds = total === 0 ? 0 : (p.linkedTo.get(target) ?? 0) / total;
    return (phraseOdds + PHRASE_PRIOR) * placementRate(habit, place);
  };
  const kind = (k: number): number => {
    const p = phrases[hit.anchorPhrases[k]];
    let best = KIND_ORDER.length;
    for (const r of p.names) if (r.target === target) best = Math.min(best, KIND_ORDER.indexOf(r.kind));
    return best;
  };
  order.sort((a, b) => (scores === null ? 0 : scores[b] - scores[a]) || odds(b) - odds(a) || kind(a) - kind(b) || hit.anchors[b].words - hit.anchors[a].words || hit.anchors[a].offset - hit.anchors[b].offset);
  const anchors = order.map((k) => hit.anchors[k]);
  const ids = order.map((k) => hit.anchorPhrases[k]);
  const places = order.map((k) => hit.anchorPlaces[k]);
  hit.anchors.splice(0, anchors.length, ...anchors);
  hit.anchorPhrases.splice(0, ids.length, ...ids);
  hit.anchorPlaces.splice(0, places.length, ...places);
}

/**
 * The phrases of a run of stems, left to right, each the longest that starts at its word; a
 * word inside a match starts no other (so "file system" is one mention, not also "file").
 * `allowed`, when given, may refuse a phrase of two words or more at a place (by where stop
 * words stand in the prose); a shorter phrase there may still match.
 */
function scanStems(
  stem: readonly string[],
  joinNext: readonly boolean[],
  root: TrieNode,
  first: ((i: number) => TrieNode | undefined) | null,
  allowed: ((phrase: number, first: number, words: number) => boolean) | null,
  visit: (phrase: number, first: number, words: number) => void,
): void {
  for (let i = 0; i < stem.length; ) {
    let node = first === null ? root.next.get(stem[i]) : first(i);
    let words = 1;
    let best = -1;
    let bestWords = 0;
    while (node !== undefined) {
      if (node.phrase >= 0 && (allowed === null || words === 1 || allowed(node.phrase, i, words))) {
        best = node.phrase;
        bestWords = words;
      }
      if (words >= MAX_NAME_WORDS || !joinNext[i + words - 1]) break;
      node = node.next.get(stem[i + words]);
      words++;
    }
    if (best >= 0) {
      visit(best, i, bestWords);
      i += bestWords;
    } else i++;
  }
}

/**
 * Where stop words stand between the kept words of `text`: bit k set when stop words stand
 * between its kept words k and k + 1 ("Storage of tiles" -> 1, "tile storage" -> 0). Words the
 * tokenizer drops that are not stop words do not count.
 */
export function stopMask(text: string, cache: StemCache): number {
  let mask = 0;
  let kept = 0;
  let stops = false;
  forEachWord(text, (raw) => {
    if (stemToken(raw, cache) === '') {
      if (kept > 0 && isStopWord(raw)) stops = true;
      return;
    }
    if (stops && kept <= MAX_NAME_WORDS) mask |= 1 << (kept - 1);
    kept++;
    stops = false;
  });
  return mask;
}

/**
 * An inline code span's words as written: lower-cased word runs, stop words, digits and all
 * (`http2.get()` -> `http2 get`, `'/p/a/t/h?query=string'` -> `p a t h query string`). Code is a
 * name only when it is written like one, so its words are not stemmed or dropped; '' past
 * {@link MAX_NAME_WORDS} words. `keepCase`: the words as written, case and all (`Error` is not
 * `error`).
 */
export function codeKey(text: string, keepCase = false): string {
  const words: string[] = [];
  forEachWord(text, (raw) => void words.push(keepCase ? raw : raw.toLowerCase()));
  return words.length > MAX_NAME_WORDS ? '' : words.join(' ');
}

/**
 * The phrase a code span names, or -1: a name written the same way, else a name with the same
 * stems when every word of the code is kept by the tokenizer (so `Streams` names "Stream", but
 * `'/p/a/t/h?query=string'` does not name "Query string", nor `http.get()` a page called "HTTP").
 */
function codeMatchOf(code: string, byCode: ReadonlyMap<string, number>, root: TrieNode, cache: StemCache): number {
  const stems = tokenize(code, cache);
  const phrase = wholeMatch(stems, root);
  if (phrase < 0) return -1;
  const key = codeKey(code);
  if (byCode.get(key) === phrase) return phrase;
  return key !== '' && key.split(' ').length === stems.length ? phrase : -1;
}

/** The phrase that is a run of stems whole (an inline code span's words), or -1. */
function wholeMatch(stems: readonly string[], root: TrieNode): number {
  if (stems.length === 0 || stems.length > MAX_NAME_WORDS) return -1;
  let node: TrieNode | undefined = root;
  for (const stem of stems) {
    node = node.next.get(stem);
    if (node === undefined) return -1;
  }
  return node.phrase;
}

/**
 * Keep the mention as an anchor option if it is the first of its phrase and placement and does
 * not overlap a kept one; a longer match at the same start wins.
 */
function keepAnchor(hit: MentionHit, phrase: number, place: Placement, m: AnchorMatch): void {
  for (let k = 0; k < hit.anchorPhrases.length; k++) if (hit.anchorPhrases[k] === phrase && hit.anchorPlaces[k] === place) return;
  for (let k = 0; k < hit.anchors.length; k++) {
    const a = hit.anchors[k];
    if (m.offset < a.endOffset && a.offset < m.endOffset) {
      // Same place: keep the longer phrase.
      if (a.offset === m.offset && m.endOffset > a.endOffset) {
        hit.anchors[k] = m;
        hit.anchorPhrases[k] = phrase;
        hit.anchorPlaces[k] = place;
      }
      return;
    }
  }
  if (hit.anchors.length >= MENTIONS_KEPT) return;
  hit.anchors.push(m);
  hit.anchorPhrases.push(phrase);
  hit.anchorPlaces.push(place);
}

/**
 * The names a section heading gives its page, when the heading names something in code (an API
 * reference's `fs.readFile(path)`, `ERR_WIDGET_CLOSED`, `Class: fs.Dir`, a command-line option
 * `--pending-deprecation`): the heading, the part
 * after a label (`Class: fs.Dir` -> `fs.Dir`) and a call without its arguments
 * (`fs.readFile(path[, options])` -> `fs.readFile`), as prose writes them. Headings in words
 * ("Installing the widget") name a section, not the page, and give none: on a guide they made
 * many weak mentions. Common practice in API references, no source.
 */
export function headingNames(text: string): string[] {
  const label = /^[\p{L} ]{1,24}:\s+(.+)$/u.exec(text);
  const rest = label === null ? text : label[1];
  if (!CODE_NAME.test(rest)) return [];
  const out = rest === text ? [text] : [text, rest];
  const call = /^([^\s(]+)\(.*\)$/.exec(rest);
  if (call !== null) out.push(call[1]);
  return out;
}

/**
 * A name written as code: a dotted, underscored or called identifier, camelCase, an upper-case
 * constant, or a command-line option (`--name`, `-x`, with a value after `=` or a space).
 */
const CODE_NAME = /[\p{L}\p{N}$][._][\p{L}\p{N}$]|[\p{L}\p{N}$_]\(|\p{Ll}\p{Lu}|^[\p{Lu}\p{N}_]{3,}$|^--?\p{L}[\p{L}\p{N}-]*(?:[= ].*)?$/u;

/**
 * Per line of a page: prose spans with a word, inline code spans that may be anchors, content
 * links. Only Markdown lines are the author's: an HTML page's lines are its generator's, so
 * nothing there counts as alone on its line.
 */
interface LineCounts {
  readonly markdown: boolean;
  readonly words: Map<number, number>;
  readonly code: Map<number, number>;
  readonly links: Map<number, number>;
}

const WORD = /[\p{L}\p{N}]/u;

function lineCounts(facts: PageFacts | undefined): LineCounts {
  const out: LineCounts = { markdown: facts?.kind === 'markdown', words: new Map(), code: new Map(), links: new Map() };
  if (facts === undefined) return out;
  const add = (m: Map<number, number>, line: number): void => void m.set(line, (m.get(line) ?? 0) + 1);
  for (const span of facts.spans) if (WORD.test(span.text)) add(out.words, span.line);
  for (const code of facts.codeSpans ?? []) add(out.code, code.line);
  for (const link of facts.links) if (link.context === 'content') add(out.links, link.line);
  return out;
}

function match(span: SourceTokens['spans'][number], start: number, end: number, words: number): AnchorMatch {
  const { line, column } = positionInSpan(span, start);
  return { offset: span.offset + start, endOffset: span.offset + end, line, column, text: span.text.slice(start, end), kind: 'name', words, quality: words };
}

/** An inline code span as the anchor: the link wraps it whole, backticks included. */
function codeMatch(code: CodeSpan, words: number): AnchorMatch {
  return { offset: code.offset, endOffset: code.endOffset, line: code.line, column: code.column, text: code.text, kind: 'code', words, quality: words };
}

/**
 * Whether a name of `target` in `phrase` stands for the pair (source, target) as if the pair's
 * own links were absent: anchor texts count only when another page uses them.
 */
export function nameKindsFor(phrase: Phrase, source: number, target: number): NameKind[] {
  const kinds: NameKind[] = [];
  for (const ref of phrase.names) {
    if (ref.target !== target) continue;
    if (ref.users !== null) {
      let others = 0;
      for (const [user, count] of ref.users) if (user !== source) others += count;
      if (others === 0) continue;
    }
    kinds.push(ref.kind);
  }
  return kinds;
}
