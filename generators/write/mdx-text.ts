import { mathSegments } from '../../src/atlas/tex-check.ts';

/**
 * Markdown prose made safe for MDX: outside $…$ / $$…$$ math and `code` spans, `{`, `}` and `<` get a backslash
 * (MDX would read them as expressions or JSX); math and code are kept byte for byte. Line endings become \n and outer blank space is trimmed.
 */
export function mdxText(markdown: string): string {
  const text = markdown.replace(/\r\n?/g, '\n').trim();
  let out = '';
  let at = 0;
  for (const segment of mathSegments(text)) {
    out += escapeProse(text.slice(at, segment.start)) + text.slice(segment.start, segment.end);
    at = segment.end;
  }
  return out + escapeProse(text.slice(at));
}

function escapeProse(prose: string): string {
  return prose.replace(/`[^`\n]*`|\\.|[{}<]/g, (m) => (m.length >= 2 ? m : `\\${m}`));
}
