/** A generated site of many small pages (Markdown and HTML, links, headings, front matter) for the worker tests. */
import fs from 'node:fs';
import path from 'node:path';

/** Write `pages` small pages under `root`: a home page, folders of 50 pages, every tenth page HTML. */
export function writeSmallSite(root: string, pages: number): void {
  const folders = Math.ceil(pages / 50);
  for (let f = 0; f < folders; f++) fs.mkdirSync(path.join(root, `part-${f}`), { recursive: true });
  fs.writeFileSync(
    path.join(root, 'index.md'),
    `# Home\n\n${Array.from({ length: folders }, (_, f) => `- [Part ${f}](part-${f}/page-0.md)`).join('\n')}\n`,
  );
  for (let i = 1; i < pages; i++) {
    const f = i % folders;
    const next = `page-${(i + folders) % pages}`;
    const far = `../part-${(f + 7) % folders}/page-${(i * 13) % pages}`;
    const word = ['lantern', 'beacon', 'harbour', 'signal', 'tide'][i % 5];
    const name = path.join(root, `part-${f}`, `page-${i}`);
    if (i % 10 === 0) {
      fs.writeFileSync(
        `${name}.html`,
        `<html><head><title>Page ${i}</title></head><body><nav><a href="/">Home</a></nav>` +
          `<h1 id="top">Page ${i}</h1><p>The ${word} notes of page ${i}, with a <a href="${next}.md">next page</a> ` +
          `and a <a href="${far}.md#part">far page</a>.</p></body></html>\n`,
      );
    } else {
      fs.writeFileSync(
        `${name}.md`,
        `---\ntitle: Page ${i} on the ${word}\n---\n# Page ${i}\n\n## Part\n\nNotes on the ${word} for page ${i}: ` +
          `read [the next one](${next}.md) or [a far one](${far}.md#part).\n\n` +
          '```\ncode block ' + i + '\n```\n\n| a | b |\n|---|---|\n| ' + word + ' | ' + i + ' |\n',
      );
    }
  }
}
