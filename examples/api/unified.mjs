// Run linkweave inside a unified (remark) pipeline that processes the site file by file.
//   npm run build && node examples/api/unified.mjs
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import remarkFrontmatter from 'remark-frontmatter';
import remarkParse from 'remark-parse';
import { glob } from 'tinyglobby';
import { unified } from 'unified';
import { VFile } from 'vfile';
import { reporter } from 'vfile-reporter';
import { createCollector, linkweaveCollect } from 'linkweave/unified';

const root = fileURLToPath(new URL('../docs-site/', import.meta.url));
const config = JSON.parse(await readFile(`${root}linkweave.config.json`, 'utf8'));

// One collector for the whole site; the same options as analyze().
const collector = createCollector({ ...config, root });
const processor = unified().use(remarkParse).use(remarkFrontmatter).use(linkweaveCollect, { collector });

const files = [];
for (const path of (await glob('**/*.md', { cwd: root })).sort()) {
  const file = new VFile({ path, cwd: root, value: await readFile(`${root}${path}`) });
  await processor.run(processor.parse(file), file);
  files.push(file);
}
// Pages that are not Markdown can be added directly.
for (const path of (await glob('**/*.html', { cwd: root })).sort()) collector.add(path, await readFile(`${root}${path}`));

const report = await collector.report(); // the same Report as analyze({ ...config, root })
for (const file of files) collector.attach(file); // findings become vfile messages
console.log(reporter(files, { quiet: true }));
console.log(`${report.stats.pages} pages; the run ${report.gate.passed ? 'passes' : 'fails'}`);
