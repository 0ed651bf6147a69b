/** A permanent slug: lowercase ASCII letters and digits in words joined by single hyphens, 1–80 characters. */
export const SLUG_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** Why `value` is not a valid slug, or null when it is one. */
export function slugProblem(value: unknown): string | null {
  if (typeof value !== 'string') return `must be a string, got ${describeValue(value)}`;
  if (value.length === 0 || value.length > 80) return `must have 1 to 80 characters, got ${value.length}`;
  if (!SLUG_PATTERN.test(value)) return `must be lowercase words joined by hyphens (a-z, 0-9, -), got ${JSON.stringify(value)}`;
  return null;
}

/** A short description of a value for error messages: its JSON text (cut at 60 characters) or its type. */
export function describeValue(value: unknown): string {
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (value === undefined) return 'nothing';
  if (typeof value === 'function') return 'a function';
  if (typeof value === 'bigint' || typeof value === 'symbol') return `a ${typeof value}`;
  let text: string;
  try {
    text = JSON.stringify(value) ?? typeof value;
  } catch {
    text = Array.isArray(value) ? 'an array' : 'an object';
  }
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}
