import katex from 'katex';
import type { ValidationIssue } from './validation-issue.ts';

/**
 * Checks every $…$ and $$…$$ formula of a Markdown text with KaTeX (throwOnError, strict: 'error', as the site
 * renders), and that no dollar sign is left unclosed (write \$ for a literal dollar). Returns one issue per bad
 * formula, naming the field path.
 */
export function texIssues(text: string, path: string): ValidationIssue[] {
  const issues: ValidationIssue[] = [];
  for (const segment of mathSegments(text)) {
    if (segment.unclosed) {
      issues.push({ path, message: `unclosed ${segment.display ? '$$' : '$'} at character ${segment.start}` });
      continue;
    }
    try {
      katex.renderToString(segment.tex, { throwOnError: true, displayMode: segment.display, strict: 'error' });
    } catch (error) {
      issues.push({ path, message: `TeX error in $${segment.tex}$: ${firstLine(error)}` });
    }
  }
  return issues;
}

/** A formula found in Markdown text: its TeX, whether displayed ($$), its start offset, whether it was closed. */
export interface MathSegment {
  readonly tex: string;
  readonly display: boolean;
  readonly start: number;
  readonly end: number;
  readonly unclosed: boolean;
}

/** The math segments of a Markdown text in order; `\$` is a literal dollar and never opens or closes math. */
export function mathSegments(text: string): MathSegment[] {
  const out: MathSegment[] = [];
  let i = 0;
  while (i < text.length) {
    if (text[i] === '\\') { i += 2; continue; }
    if (text[i] !== '$') { i++; continue; }
    const display = text[i + 1] === '$';
    const delimiter = display ? '$$' : '$';
    const from = i + delimiter.length;
    let j = from;
    while (j < text.length && !(text[j] === '$' && text.startsWith(delimiter, j))) j += text[j] === '\\' ? 2 : 1;
    if (j >= text.length) {
      out.push({ tex: text.slice(from), display, start: i, end: text.length, unclosed: true });
      break;
    }
    out.push({ tex: text.slice(from, j), display, start: i, end: j + delimiter.length, unclosed: false });
    i = j + delimiter.length;
  }
  return out;
}

function firstLine(error: unknown): string {
  return (error instanceof Error ? error.message : String(error)).split('\n')[0]!;
}
