import { describe, expect, it } from 'vitest';
import { contentDir } from '../../src/site/content-dir.ts';

describe('contentDir', () => {
  it.each([
    [{}, './content'],
    [{ ATLAS_CONTENT_DIR: '' }, './content'],
    [{ ATLAS_CONTENT_DIR: './test/fixtures/content/' }, './test/fixtures/content'],
    [{ ATLAS_CONTENT_DIR: '/abs/atlas' }, '/abs/atlas'],
  ])('%j → %s', (env, want) => expect(contentDir(env)).toBe(want));
});
