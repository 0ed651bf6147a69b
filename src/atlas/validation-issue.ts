/** One thing wrong with a definition or a content file: the field path (`instances[1].parameters.r2`) and why. */
export interface ValidationIssue {
  readonly path: string;
  readonly message: string;
}

/** Joins path segments as a reader writes them: names with dots, array positions in brackets. */
export function fieldPath(segments: readonly PropertyKey[]): string {
  let out = '';
  for (const segment of segments) {
    if (typeof segment === 'number') out += `[${segment}]`;
    else if (typeof segment === 'symbol') out += `[${String(segment)}]`;
    else out += /^[A-Za-z_$][\w$]*$/.test(segment) ? (out ? `.${segment}` : segment) : `[${JSON.stringify(segment)}]`;
  }
  return out || '(root)';
}

/** One line per issue, `<where>: <path>: <message>`, at most `limit` lines plus a count of the rest. */
export function formatIssues(where: string, issues: readonly ValidationIssue[], limit = 20): string {
  const lines = issues.slice(0, limit).map((i) => `${where}: ${i.path}: ${i.message}`);
  if (issues.length > limit) lines.push(`${where}: … and ${issues.length - limit} more`);
  return lines.join('\n');
}
