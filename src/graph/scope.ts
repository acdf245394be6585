/**
 * Link scope: links that are part of the site but not of these sources. Pure.
 *
 * - "templated": the destination holds template syntax (`{{`, `{%`, `<%`): the generator fills
 *   it in at build time, so it is never resolved and never broken.
 * - "outside the content": a link that matches nothing here and that points outside the
 *   sources: a site-absolute link outside the base path, a relative link that climbs above the
 *   base path (or a file link above the content root), or a link under a prefix that is mounted
 *   from elsewhere or configured as `outside` (and the generator's own pages with no source).
 */

const TEMPLATE_SYNTAX = /\{\{|\{%|<%|%7B%7B|%7B%25|%3C%25/i;

/** True when a destination holds template syntax. */
export function isTemplated(href: string): boolean {
  return TEMPLATE_SYNTAX.test(href);
}

/** What the scope check needs. */
export interface ScopeContext {
  /** Base path with a trailing slash. */
  readonly basePath: string;
  /** Route prefixes outside the content, each with a trailing slash, as written and under the base path. */
  readonly outside: readonly string[];
  /** Exact routes the generator makes with no source (trailing slash), as written and under the base path. */
  readonly generated: ReadonlySet<string>;
  /** Site-absolute links are written below the base path: never outside for that reason. */
  readonly absoluteUnderBase: boolean;
}

/**
 * Build the scope context.
 * @param basePath base path with a trailing slash
 * @param outside `outside` prefixes (site-absolute)
 * @param generated `generated.routes` (site-absolute)
 * @param absoluteUnderBase `routes.absoluteLinksUnderBase`
 */
export function scopeContext(basePath: string, outside: readonly string[], generated: readonly string[], absoluteUnderBase = false): ScopeContext {
  const forms = (p: string): string[] => {
    const slashed = p.endsWith('/') ? p : `${p}/`;
    return basePath === '/' || slashed.startsWith(basePath) ? [slashed] : [slashed, basePath + slashed.slice(1)];
  };
  return { basePath, outside: [...new Set(outside.flatMap(forms))], generated: new Set(generated.flatMap(forms)), absoluteUnderBase };
}

/**
 * True when an unresolved link points outside the content (see the module comment).
 * @param href the destination as written
 * @param target the path it resolved to (a route, site-absolute)
 * @param routeDir the folder of the page's route URL (with the base path), null when unknown
 * @param fileDir the folder of the page's file (relative to the content root)
 * @param fileLink true when the link names a source file (resolved against the file)
 */
export function isOutside(href: string, target: string, routeDir: string | null, fileDir: string, fileLink: boolean, ctx: ScopeContext): boolean {
  const path = pathOf(href);
  if (/^[\\/](?![\\/])/.test(path)) {
    if (!ctx.absoluteUnderBase && ctx.basePath !== '/' && !path.startsWith(ctx.basePath) && path !== ctx.basePath.slice(0, -1)) return true;
  } else if (!/^[a-zA-Z][a-zA-Z0-9+.-]*:/.test(path)) {
    const depth = fileLink ? segments(fileDir) : routeDir === null ? null : segments(routeDir) - segments(ctx.basePath);
    if (depth !== null && climb(path) > depth) return true;
  }
  const t = target.startsWith('/') ? target : `/${target}`;
  const slashed = t.endsWith('/') ? t : `${t}/`;
  if (ctx.generated.has(slashed)) return true;
  for (const prefix of ctx.outside) if (slashed.startsWith(prefix)) return true;
  return false;
}

function pathOf(href: string): string {
  const cut = href.search(/[?#]/);
  return (cut < 0 ? href : href.slice(0, cut)).trim();
}

function segments(dir: string): number {
  return dir.split('/').filter((s) => s !== '').length;
}

/** How many folders above its start a relative path reaches at its highest (0: never above). */
function climb(path: string): number {
  let level = 0;
  let lowest = 0;
  const parts = path.split(/[\\/]/);
  for (let i = 0; i < parts.length; i++) {
    const s = parts[i];
    if (s === '..' || s.toLowerCase() === '%2e%2e') level--;
    else if (s !== '' && s !== '.' && i < parts.length - 1) level++;
    lowest = Math.min(lowest, level);
  }
  return -lowest;
}
