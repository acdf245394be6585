/** The route options the ground floor reads (the resolved `routes` options satisfy it). */
export interface RouteOptions {
  /** `directory`: a/b.md -> /a/b/; `html`: a/b.md -> /a/b.html. */
  readonly style: 'directory' | 'html';
  /** URL prefix of the site. */
  readonly basePath: string;
  /** File names (without extension) that stand for their folder. */
  readonly indexNames: readonly string[];
  /** Match routes without regard to case. */
  readonly caseInsensitive: boolean;
  /** Folder (relative to the content root) -> route prefix its files are served under. */
  readonly folders: Readonly<Record<string, string>>;
  /** Folders of dated posts. */
  readonly dated: readonly string[];
  /** Site-absolute links are written below the base path. */
  readonly absoluteLinksUnderBase: boolean;
  /** Whose rules turn frontmatter permalinks, slugs and file names into routes. */
  readonly generator: 'none' | 'jekyll' | 'hugo' | 'docusaurus';
  /** Permalink patterns of the generator (Hugo section or Jekyll collection -> pattern). */
  readonly permalinks: Readonly<Record<string, string>>;
}
