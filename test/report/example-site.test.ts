/**
 * The example site (examples/docs-site) through the built command line, as a newcomer runs it
 * from the repository folder: the terminal report, the Markdown comment and the text of the
 * HTML report, each against a snapshot read by a person; and the apply command the report
 * prints, run as a process exactly as printed (with --dry-run added), writes at least one link.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repo = fileURLToPath(new URL('../..', import.meta.url));
const bin = fileURLToPath(new URL('../../dist/cli/bin.js', import.meta.url));

function linkweave(args: readonly string[]) {
  const r = spawnSync(process.execPath, [bin, ...args], { cwd: repo, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' } });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** The visible text of an HTML page: no script or style, one line per element, spaces collapsed. */
function htmlText(html: string): string {
  return html
    .replace(/<(script|style)\b[^>]*>[\s\S]*?<\/\1>/g, '')
    .replace(/<[^>]+>/g, '\n')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .split('\n')
    .map((l) => l.replace(/\s+/g, ' ').trim())
    .filter((l) => l !== '')
    .join('\n');
}

describe('the example site, as a newcomer sees it', () => {
  const text = linkweave(['suggest', 'examples/docs-site', '--no-cache']);

  it('terminal report (100 columns when not a terminal; the run fails with exit 1 as planted)', async () => {
    expect(text.code).toBe(1);
    expect(text.stderr).toBe('linkweave: heading ids: github style (chosen by the fragment links), 20 of 23 fragment links resolve\n');
    await expect(text.stdout).toMatchFileSnapshot('__snapshots__/example-site.txt');
    const command = (l: string) => l.startsWith('  linkweave apply ');
    for (const line of text.stdout.split('\n')) if (!command(line)) expect(line.length).toBeLessThanOrEqual(100);
  });

  it('Markdown comment', async () => {
    const md = linkweave(['suggest', 'examples/docs-site', '--no-cache', '--format', 'markdown']);
    expect(md.code).toBe(1);
    await expect(md.stdout).toMatchFileSnapshot('__snapshots__/example-site.md');
  });

  it('HTML report text (the root as typed, no machine path)', async () => {
    const html = linkweave(['suggest', 'examples/docs-site', '--no-cache', '--format', 'html']);
    expect(html.code).toBe(1);
    expect(html.stdout).not.toContain(repo);
    await expect(htmlText(html.stdout)).toMatchFileSnapshot('__snapshots__/example-site.html.txt');
  });

  it('the printed apply command runs exactly as printed (with --dry-run) and would write every link it names', () => {
    const lines = text.stdout.split('\n');
    const printed = lines.find((l) => l.startsWith('  linkweave apply '))?.trim();
    expect(printed).toMatch(/^linkweave apply examples\/docs-site --ids [0-9a-f]{12}(,[0-9a-f]{12})+$/);
    const ids = printed!.split(' ').at(-1)!.split(',');
    const words = printed!.split(' ');
    expect(words[0]).toBe('linkweave');
    const run = linkweave([...words.slice(1), '--dry-run']);
    expect(run.stderr).not.toMatch(/refused|unknown id|no anchor/i);
    expect(run.code).toBe(0);
    const added = run.stdout.split('\n').filter((l) => l.startsWith('+') && !l.startsWith('+++'));
    expect(added.length).toBeGreaterThanOrEqual(1);
    expect(added.join('\n')).toMatch(/\]\([^)]+\)/);
    expect(run.stderr).toContain(`${ids.length} link`);
  });
});
