/**
 * Markdown blocks of synthetic prose: sentences mixing function words, the common vocabulary
 * and the page's topic words; paragraphs with inline links and inline code; lists, fenced code
 * blocks, tables and notes.
 */
import type { PlannedLink } from './links.js';
import type { Topic } from './plan.js';
import type { Random } from './prng.js';
import { intBetween, pick, skewedIndex } from './prng.js';
import { COMMON_WORDS, FUNCTION_WORDS, capitalize } from './words.js';

/** What prose of one page draws its words from. */
export interface Voice {
  readonly rnd: Random;
  readonly topic: Topic;
  /** A few topic words this page is mostly about. */
  readonly focus: readonly string[];
  /** Every topic, for rare words from elsewhere. */
  readonly topics: readonly Topic[];
  /** The site-wide vocabulary, most common first (empty: a `topical` site). */
  readonly shared: readonly string[];
}

/** Pick the words a page focuses on. */
export function focusWords(rnd: Random, topic: Topic): string[] {
  const out: string[] = [];
  for (let i = 0; i < 5; i++) out.push(topic.words[skewedIndex(rnd, topic.words.length, 1.6)]!);
  return out;
}

function word(v: Voice): string {
  // A `shared` site: a third of the words come from the site-wide vocabulary instead, with a
  // heavy head (u^3: the first word is drawn about 10,000 times as often as the last).
  if (v.shared.length > 0 && v.rnd() < 0.35) return v.shared[skewedIndex(v.rnd, v.shared.length, 3)]!;
  const r = v.rnd();
  if (r < 0.34) return pick(v.rnd, FUNCTION_WORDS);
  if (r < 0.66) return pick(v.rnd, COMMON_WORDS);
  if (r < 0.8) return pick(v.rnd, v.focus);
  if (r < 0.975) return v.topic.words[skewedIndex(v.rnd, v.topic.words.length, 1.4)]!;
  const other = pick(v.rnd, v.topics);
  return pick(v.rnd, other.words);
}

/** One sentence of 8-20 words, sometimes with inline code, ending in a full stop. */
export function sentence(v: Voice, link?: PlannedLink): string {
  const n = intBetween(v.rnd, 8, 20);
  const words: string[] = [];
  for (let i = 0; i < n; i++) words.push(word(v));
  words[0] = capitalize(words[0]!);
  if (v.rnd() < 0.15) {
    const at = intBetween(v.rnd, 1, n - 1);
    words[at] = `\`${pick(v.rnd, v.focus)}.${pick(v.rnd, COMMON_WORDS)}()\``;
  }
  if (link !== undefined) {
    const at = intBetween(v.rnd, 2, n);
    words.splice(at, 0, `[${link.text}](${link.href})`);
  }
  return `${words.join(' ')}.`;
}

/**
 * A paragraph of 3-6 sentences carrying the given links, and sometimes a plain mention of a
 * related page's title (text an anchor phrase can later be found in).
 */
export function paragraph(v: Voice, links: readonly PlannedLink[], mention: string | null): string {
  const count = Math.max(intBetween(v.rnd, 3, 6), links.length);
  const out: string[] = [];
  for (let i = 0; i < count; i++) out.push(sentence(v, links[i]));
  if (mention !== null) {
    out.splice(intBetween(v.rnd, 0, out.length), 0, `Read about ${mention.toLowerCase()} in the ${pick(v.rnd, COMMON_WORDS)} section.`);
  }
  return out.join(' ');
}

/** A bullet list of 3-6 short items; links go on the first items. */
export function list(v: Voice, links: readonly PlannedLink[]): string {
  const count = Math.max(intBetween(v.rnd, 3, 6), links.length);
  const out: string[] = [];
  for (let i = 0; i < count; i++) {
    const link = links[i];
    const text = link === undefined ? shortPhrase(v) : `[${link.text}](${link.href}): ${shortPhrase(v)}`;
    out.push(`- ${text}`);
  }
  return out.join('\n');
}

function shortPhrase(v: Voice): string {
  const n = intBetween(v.rnd, 3, 9);
  const words: string[] = [];
  for (let i = 0; i < n; i++) words.push(word(v));
  words[0] = capitalize(words[0]!);
  return words.join(' ');
}

const LANGUAGES = ['js', 'bash', 'yaml', 'json', 'python'] as const;

/** A fenced code block of 3-10 lines whose identifiers come from the topic. */
export function codeBlock(v: Voice): string {
  const lang = pick(v.rnd, LANGUAGES);
  const lines: string[] = [];
  const n = intBetween(v.rnd, 3, 10);
  for (let i = 0; i < n; i++) {
    const a = pick(v.rnd, v.focus);
    const b = pick(v.rnd, COMMON_WORDS);
    const k = intBetween(v.rnd, 1, 500);
    switch (lang) {
      case 'js':
        lines.push(i === 0 ? `import { ${a} } from '${b}';` : `const ${b}${k} = ${a}.${b}({ ${pick(v.rnd, COMMON_WORDS)}: ${k} });`);
        break;
      case 'bash':
        lines.push(`${a} ${b} --${pick(v.rnd, COMMON_WORDS)}=${k}`);
        break;
      case 'yaml':
        lines.push(i === 0 ? `${a}:` : `  ${b}_${k}: ${pick(v.rnd, COMMON_WORDS)}`);
        break;
      case 'json':
        lines.push(i === 0 ? '{' : `  "${a}": { "${b}": ${k} }${i === n - 1 ? '' : ','}`);
        break;
      default:
        lines.push(`${b}_${k} = ${a}.${pick(v.rnd, COMMON_WORDS)}(${k})`);
    }
  }
  if (lang === 'json') lines.push('}');
  return `\`\`\`${lang}\n${lines.join('\n')}\n\`\`\``;
}

/** A table of options: name, default, description. */
export function table(v: Voice): string {
  const rows = ['| Option | Default | Description |', '| --- | --- | --- |'];
  const n = intBetween(v.rnd, 3, 6);
  for (let i = 0; i < n; i++) {
    rows.push(`| \`${pick(v.rnd, v.focus)}_${pick(v.rnd, COMMON_WORDS)}\` | \`${intBetween(v.rnd, 0, 100)}\` | ${shortPhrase(v)} |`);
  }
  return rows.join('\n');
}

/** A one-sentence note in a block quote. */
export function note(v: Voice): string {
  return `> **Note:** ${sentence(v)}`;
}
