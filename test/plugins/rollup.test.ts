/**
 * `linkweave/rollup` in a real Rolldown build through the Rollup-style JavaScript API
 * (`rolldown()`, `bundle.write()`, `bundle.close()`, which runs `closeBundle` as Rollup's does).
 * The HTML pages are emitted by a small page plugin, as HTML plugins for Rollup do; the output
 * folder comes from `output.dir`, the summary goes to the plugin context's `this.info`.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { rolldown } from 'rolldown';
import type { Plugin, RolldownLog } from 'rolldown';
import { afterAll, describe, expect, it } from 'vitest';
import { analyze } from '../../src/analyze.js';
import linkweave from '../../src/plugins/rollup.js';

const temp = fs.mkdtempSync(path.join(os.tmpdir(), 'linkweave-rollup-'));
afterAll(() => fs.rmSync(temp, { recursive: true, force: true }));

const page = (title: string, body: string) =>
  `<!doctype html>\n<html>\n<head><title>${title}</title><script type="module" src="/main.js"></script></head>\n<body>\n<h1>${title}</h1>\n${body}\n</body>\n</html>\n`;

/** Emits the given pages next to the bundled script. */
function pages(files: Record<string, string>): Plugin {
  return {
    name: 'pages',
    generateBundle() {
      for (const [fileName, source] of Object.entries(files)) this.emitFile({ type: 'asset', fileName, source });
    },
  };
}

async function bundle(name: string, files: Record<string, string>, failBuild = true) {
  const src = path.join(temp, `${name}-src`);
  fs.mkdirSync(src, { recursive: true });
  fs.writeFileSync(path.join(src, 'main.js'), "document.title += ' (ready)';\n");
  const dir = path.join(temp, `${name}-out`);
  const logs: { level: string; log: RolldownLog }[] = [];
  const build = await rolldown({
    input: path.join(src, 'main.js'),
    plugins: [pages(files), linkweave({ config: { cache: { enabled: false } }, failBuild })],
    onLog: (level, log) => void logs.push({ level, log }),
  });
  await build.write({ dir, entryFileNames: 'main.js' });
  return { dir, logs, close: () => build.close() };
}

describe('linkweave/rollup in a real Rolldown build', () => {
  it('analyses the written output folder and logs the summary through this.info', async () => {
    const { dir, logs, close } = await bundle('ok', {
      'index.html': page('Home', '<p><a href="notes/">Notes</a></p>'),
      'notes/index.html': page('Notes', '<p><a href="../">Home</a> and <a href="tags.html">tags</a></p>'),
      'notes/tags.html': page('Tags', '<p><a href="/notes/">Back</a></p>'),
    });
    await close();
    const direct = await analyze({ include: ['**/*.html'], cache: { enabled: false }, root: dir });
    expect(direct.pages.map((p) => p.route)).toEqual(['/', '/notes/', '/notes/tags.html']);
    const info = logs.filter((l) => l.level === 'info' && l.log.plugin === 'linkweave').map((l) => l.log.message);
    expect(info).toHaveLength(1);
    expect(info[0]).toContain(`linkweave: 3 pages, 4 links, 0 broken links`);
    expect(info[0]).toContain('Findings: none. The build passes: no errors, no limit crossed.');
    expect(direct.gate.passed).toBe(true);
  });

  it('fails bundle.close() with the broken link at file:line:column, or warns with failBuild: false', async () => {
    const files = {
      'index.html': page('Home', '<p><a href="gone.html">Gone</a></p>'),
      'other.html': page('Other', '<p><a href="/">Home</a></p>'),
    };
    const failing = await bundle('broken', files);
    await expect(failing.close()).rejects.toThrowError(
      `${path.join(failing.dir, 'index.html')}:6:4  error  Broken link: no page /gone.html (written "gone.html"); fix or remove the link  (broken-link)`,
    );

    const passing = await bundle('broken-passing', files, false);
    await passing.close();
    const warnings = passing.logs.filter((l) => l.level === 'warn' && l.log.plugin === 'linkweave').map((l) => l.log.message);
    expect(warnings.join('\n')).toContain(`${path.join(passing.dir, 'index.html')}:6:4  error  Broken link: no page /gone.html`);
  });
});
