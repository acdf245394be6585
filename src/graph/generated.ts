/**
 * Links the site generator makes on the pages it builds, which are not in the sources:
 * a section's index page lists the pages and sub-sections of its folder (Hugo's `_index.md`)
 * and of the folders below it that are no sections (no `_index.md`),
 * and each dated post links the previous and the next one (blog posts), and the generated post
 * index, which the site's navigation links from every page, lists every post (an edge from
 * each entry page stands for it). They are template edges (like a sidebar's). Pure.
 */
import type { PageNode } from '../types.js';

/** A generated link: from page, to page. */
export interface GeneratedEdge {
  readonly from: number;
  readonly to: number;
}

/**
 * The generated edges of a site.
 * @param pages the graph's pages (by id)
 * @param sectionLists `generated.sectionLists`
 * @param postFolders `generated.postFolders`
 * @param entries the entry pages' ids
 */
export function generatedEdges(pages: readonly PageNode[], sectionLists: boolean, postFolders: readonly string[], entries: readonly number[] = []): GeneratedEdge[] {
  const edges: GeneratedEdge[] = [];
  if (sectionLists) {
    const sections = new Map<string, number>();
    for (const p of pages) if (/(^|\/)_index\.[^/]+$/.test(p.file)) sections.set(folderOf(p.file), p.id);
    for (const p of pages) {
      const folder = folderOf(p.file);
      const isSection = sections.get(folder) === p.id;
      // A page belongs to its folder's section; a section (and a leaf bundle's index.md) to its parent's.
      const ownerFolder = isSection || /(^|\/)index\.[^/]+$/.test(p.file) ? folderOf(folder.slice(0, -1)) : folder;
      // A deeper folder without `_index.md` is no section: its pages are listed by the nearest
      // section above it (Hugo; checked on a hugo 0.111 build of its own docs, news/2021/).
      let from = ownerFolder;
      let owner = sections.get(from);
      while (owner === undefined && /^[^/]+\/.+\/$/.test(from)) {
        from = folderOf(from.slice(0, -1));
        owner = sections.get(from);
      }
      // A top-level folder is a section even without `_index.md`: its generated list page, which
      // has no source, is reached from the home page, so the home page stands for it.
      if (owner === undefined && /^[^/]+\/$/.test(from)) owner = sections.get('');
      if (owner !== undefined && owner !== p.id) edges.push({ from: owner, to: p.id });
    }
  }
  for (const folder of postFolders) {
    const prefix = folder.endsWith('/') ? folder : `${folder}/`;
    // The folder's own index is no post; a post may be a folder with its index (`2021-08-26-welcome/index.mdx`).
    const posts = pages.filter((p) => p.file.startsWith(prefix) && !/^(?:_?index|README)\.[^/]+$/i.test(p.file.slice(prefix.length)));
    posts.sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : 0));
    for (const entry of entries) for (const p of posts) if (p.id !== entry) edges.push({ from: entry, to: p.id });
    for (let i = 1; i < posts.length; i++) {
      edges.push({ from: posts[i - 1].id, to: posts[i].id }, { from: posts[i].id, to: posts[i - 1].id });
    }
  }
  return edges;
}

/** `a/b/` for `a/b/c.md`, '' at the root. */
function folderOf(path: string): string {
  return path.slice(0, path.lastIndexOf('/') + 1);
}
