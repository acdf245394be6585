/** vitest setupFiles: after each test file, the repository's cache folder is as the run found it (see repo-cache.ts). */
import { afterAll, inject } from 'vitest';
import { REPO_CACHE, repoCacheListing } from './repo-cache.js';

afterAll(() => {
  if (repoCacheListing() !== inject('repoCacheListing')) {
    throw new Error(`this test file wrote the repository's cache folder ${REPO_CACHE}; give it a temporary cache folder`);
  }
});
