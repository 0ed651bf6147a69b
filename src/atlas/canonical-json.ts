/**
 * Canonical JSON text of plain data (with `compactNumberArrays`, arrays holding only numbers, nulls or such arrays
 * are written on one line, for large numeric files): object keys sorted by UTF-16 code units at every depth, two-space indent,
 * a trailing newline, numbers written by JSON.stringify (shortest round-trip form; −0 becomes 0). Properties whose
 * value is undefined are left out, as JSON.stringify does. Throws a TypeError naming the path on a non-finite
 * number, a function, a bigint, a symbol or undefined inside an array, so no value is ever silently changed.
 */
export function canonicalJson(value: unknown, options: { compactNumberArrays?: boolean } = {}): string {
  const sorted = sortedCopy(value, '$');
  return `${options.compactNumberArrays ? compactWrite(sorted, '') : JSON.stringify(sorted, null, 2)}\n`;
}

/** Arrays of numbers and nulls, and arrays of those, go on one line; everything else as JSON.stringify(…, 2) would. */
function compactWrite(value: unknown, indent: string): string {
  const flat = (v: unknown): boolean => v === null || typeof v === 'number';
  if (Array.isArray(value) && value.every((v) => flat(v) || (Array.isArray(v) && v.every(flat)))) return JSON.stringify(value);
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    return value.length === 0 ? '[]' : `[\n${value.map((v) => inner + compactWrite(v, inner)).join(',\n')}\n${indent}]`;
  }
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value);
    return entries.length === 0 ? '{}' : `{\n${entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${compactWrite(v, inner)}`).join(',\n')}\n${indent}}`;
  }
  return JSON.stringify(value);
}

function sortedCopy(value: unknown, path: string): unknown {
  if (value === null || typeof value === 'string' || typeof value === 'boolean') return value;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new TypeError(`${path}: number must be finite, got ${value}`);
    return value === 0 ? 0 : value;
  }
  if (Array.isArray(value)) {
    return value.map((item, i) => {
      if (item === undefined) throw new TypeError(`${path}[${i}]: undefined inside an array`);
      return sortedCopy(item, `${path}[${i}]`);
    });
  }
  if (typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort()) {
      const item = (value as Record<string, unknown>)[key];
      if (item !== undefined) out[key] = sortedCopy(item, `${path}.${key}`);
    }
    return out;
  }
  throw new TypeError(`${path}: ${typeof value} is not JSON data`);
}
