// Check the built site at the end of `vite build`.
//   npm run build && npx vite build --config examples/api/vite.config.mjs
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import linkweave from 'linkweave/vite';

const site = fileURLToPath(new URL('./site/', import.meta.url));

export default defineConfig({
  root: site,
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // A multi-page site: every HTML page is an input.
    rolldownOptions: { input: { main: `${site}index.html`, guide: `${site}guide/index.html`, notes: `${site}guide/notes.html` } },
  },
  plugins: [
    linkweave({
      // The keys of linkweave.config.json; `include` defaults to the built HTML pages here.
      config: { maxDepth: 2, limits: { orphans: 0 } },
      // Written after the analysis (paths relative to Vite's root), also when the gate fails.
      reports: [{ format: 'json', file: 'dist/linkweave-report.json' }],
      // The build fails when the gate fails; `failBuild: false` only reports.
      failBuild: true,
    }),
  ],
});
