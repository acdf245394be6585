/**
 * The fitted link model beside the other caches: one file, `link-model.json`, holding the last
 * fit and its key (`fitKey` in `src/suggest/model.ts`: a sha256 of the rows and labels the fit
 * read), under the tool version and code hash (`codeVersion`). A run whose training rows are the
 * same to the bit takes the model instead of fitting again.
 *
 * Only the last fit is kept: in CI the cache comes from the main branch's last run, and that is
 * the fit a pull request can reuse. A file that does not parse, is of another schema, version,
 * code or key, or holds anything but finite numbers where numbers belong, is ignored (and
 * replaced by the next fit), never trusted. Written atomically (temp file + rename); never
 * throws: a cache that cannot be used is skipped.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { join } from 'node:path';
import type { FitMemo, LogisticModel } from '../types.js';
import { codeVersion } from './code.js';

const MODEL_SCHEMA = 'linkweave/model-cache@1';
const MODEL_FILE = 'link-model.json';

/** The fit memo of the cache folder `dir`, for the tool version `version`. */
export function linkModelStore(dir: string, version: string): FitMemo {
  const file = join(dir, MODEL_FILE);
  return {
    get(key: string): LogisticModel | null {
      try {
        const stored = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown> | null;
        if (typeof stored !== 'object' || stored === null) return null;
        if (stored.schema !== MODEL_SCHEMA || stored.code !== codeVersion(version) || stored.key !== key) return null;
        return isModel(stored.model) ? stored.model : null;
      } catch {
        return null;
      }
    },
    set(key: string, model: LogisticModel): void {
      if (!isModel(model)) return; // a non-finite number would not come back from JSON as it was
      const temp = join(dir, `.${MODEL_FILE}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
      try {
        fs.mkdirSync(dir, { recursive: true });
        fs.writeFileSync(temp, `${JSON.stringify({ schema: MODEL_SCHEMA, code: codeVersion(version), key, model })}\n`);
        fs.renameSync(temp, file);
      } catch {
        try {
          fs.rmSync(temp, { force: true });
        } catch {
          // The folder itself is unusable; there is nothing to clean.
        }
      }
    },
  };
}

/** A `LogisticModel` whose numbers are all finite (so JSON keeps them to the bit). */
function isModel(value: unknown): value is LogisticModel {
  if (typeof value !== 'object' || value === null) return false;
  const m = value as Record<string, unknown>;
  const finite = (x: unknown): boolean => typeof x === 'number' && Number.isFinite(x);
  const vector = (x: unknown): boolean => Array.isArray(x) && x.every(finite);
  const { weights, means, scales } = m;
  return (
    finite(m.intercept) &&
    vector(weights) &&
    vector(means) &&
    vector(scales) &&
    (weights as unknown[]).length === (means as unknown[]).length &&
    (weights as unknown[]).length === (scales as unknown[]).length &&
    Number.isInteger(m.iterations) &&
    typeof m.converged === 'boolean'
  );
}
