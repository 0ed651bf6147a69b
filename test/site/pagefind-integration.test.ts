import { beforeEach, describe, expect, it, vi } from 'vitest';

// The Pagefind binary is mocked here; test/site/search.e2e.test.ts exercises it for real over a built site.
const calls: string[] = [];
const state = { addErrors: [] as string[], createErrors: [] as string[], noIndex: false };
vi.mock('pagefind', () => ({
  createIndex: async (options: unknown) => {
    calls.push(`create ${JSON.stringify(options)}`);
    if (state.noIndex) return { index: undefined, errors: state.createErrors };
    return {
      errors: [],
      index: {
        addDirectory: async ({ path }: { path: string }) => { calls.push(`add ${path}`); return { errors: state.addErrors, page_count: 3 }; },
        writeFiles: async ({ outputPath }: { outputPath: string }) => { calls.push(`write ${outputPath}`); return { errors: [], outputPath }; },
      },
    };
  },
  close: async () => { calls.push('close'); },
}));

const { pagefindIndex, EXCLUDE_SELECTORS } = await import('../../src/site/pagefind-integration.ts');
const run = () => {
  const hook = pagefindIndex().hooks['astro:build:done'] as unknown as (o: unknown) => Promise<void>;
  return hook({ dir: new URL('file:///site/dist/'), logger: { info: (m: string) => calls.push(`log ${m}`) } });
};

describe('pagefindIndex', () => {
  beforeEach(() => { calls.length = 0; Object.assign(state, { addErrors: [], createErrors: [], noIndex: false }); });
  it('indexes dist/ into dist/pagefind/ in English, skipping KaTeX duplicates, then closes', async () => {
    await run();
    expect(calls).toEqual([
      `create ${JSON.stringify({ forceLanguage: 'en', excludeSelectors: EXCLUDE_SELECTORS })}`,
      'add /site/dist/', 'write /site/dist/pagefind/', 'log pagefind indexed 3 pages', 'close',
    ]);
  });
  it('fails the build naming the step when Pagefind reports errors, and still closes', async () => {
    state.addErrors = ['bad html in x.html'];
    await expect(run()).rejects.toThrow('pagefind addDirectory failed: bad html in x.html');
    expect(calls.at(-1)).toBe('close');
  });
  it('fails when no index can be created', async () => {
    Object.assign(state, { noIndex: true, createErrors: ['no binary'] });
    await expect(run()).rejects.toThrow('pagefind createIndex failed: no binary');
    expect(calls.at(-1)).toBe('close');
  });
});
