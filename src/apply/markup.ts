/**
 * The markup of a new link, for the apply stage: defined once on the ground floor
 * (`src/routes/link-markup.ts`), where the SARIF fix takes the same function.
 */
export { hrefFor, linkMarkup, linkText, relativeFilePath, relativeRoute } from '../routes/index.js';
