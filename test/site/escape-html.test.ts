import { describe, expect, it } from 'vitest';
import { escapeHtml } from '../../src/site/escape-html.ts';

describe('escapeHtml', () => {
  it('escapes the five HTML specials', () => expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;'));
});
