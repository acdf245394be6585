/**
 * The traffic CSV (DESIGN section 7): `route,views` per line, an optional header line, `#`
 * comment lines and blank lines allowed. A route is a site path (`/guide/install/`) or a full
 * URL (its path is taken, as analytics exports write them); views is a non-negative number.
 * Fields may be double-quoted (`"…"`, with `""` for a quote). A route listed twice adds up.
 * A bad row is reported with its line and skipped; the rest is kept.
 */

/** What `parseTraffic` found: views per route, and the rows it could not use. */
export interface TrafficResult {
  readonly views: Map<string, number>;
  readonly problems: { readonly line: number; readonly message: string }[];
}

const NUMBER = /^\d+(?:\.\d+)?$/;

/**
 * Parse a traffic CSV.
 * @param _file path of the CSV; problems carry only the line, the caller attaches the file
 * @param text its decoded text
 */
export function parseTraffic(_file: string, text: string): TrafficResult {
  const views = new Map<string, number>();
  const problems: { line: number; message: string }[] = [];
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  let seenRow = false;
  for (let i = 0; i < lines.length; i++) {
    const line = i + 1;
    const raw = lines[i];
    if (raw.trim() === '' || raw.trimStart().startsWith('#')) continue;
    const fields = splitCsvLine(raw);
    if (fields === null) {
      problems.push({ line, message: 'Traffic row has a quoted field that is never closed; add the closing `"`' });
      seenRow = true;
      continue;
    }
    const [first = '', second = ''] = fields.map((f) => f.trim());
    if (!seenRow) {
      seenRow = true;
      if (fields.length === 2 && !NUMBER.test(second) && !first.startsWith('/') && !/^https?:\/\//i.test(first)) continue; // header
    }
    if (fields.length !== 2) {
      problems.push({ line, message: `Traffic row has ${fields.length} field${fields.length === 1 ? '' : 's'}; write two: "route,views"` });
      continue;
    }
    const route = routeOf(first);
    if (route === null) {
      problems.push({ line, message: `Traffic row route "${first}" is not a route; start it with "/" or give an http(s) URL` });
      continue;
    }
    if (!NUMBER.test(second)) {
      problems.push({ line, message: `Traffic row views "${second}" is not a count; write a number of 0 or more` });
      continue;
    }
    views.set(route, (views.get(route) ?? 0) + Number(second));
  }
  return { views, problems };
}

function routeOf(field: string): string | null {
  if (field.startsWith('/')) return field.replace(/[?#].*$/, '') || '/';
  if (/^https?:\/\//i.test(field)) {
    try {
      return new URL(field).pathname;
    } catch {
      return null;
    }
  }
  return null;
}

/** Split one CSV line into fields; null when a quoted field does not end. */
function splitCsvLine(line: string): string[] | null {
  const fields: string[] = [];
  let i = 0;
  for (;;) {
    let field = '';
    while (line[i] === ' ' || line[i] === '\t') i++;
    if (line[i] === '"') {
      i++;
      for (;;) {
        if (i >= line.length) return null;
        if (line[i] === '"') {
          if (line[i + 1] === '"') {
            field += '"';
            i += 2;
            continue;
          }
          i++;
          break;
        }
        field += line[i];
        i++;
      }
      while (i < line.length && line[i] !== ',') field += line[i++];
    } else {
      while (i < line.length && line[i] !== ',') field += line[i++];
    }
    fields.push(field);
    if (i >= line.length) return fields;
    i++; // the comma
  }
}
