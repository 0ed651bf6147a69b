import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import { APOLLONIUS, FIVE_CONICS, startSite, type Site } from './browser.ts';
import { evaluatePlain } from './plain-polynomial.ts';

// Browser tests of the downloads over the real build: they must parse, hold the system, and let a reader check us.
// Apollonius: 8 circles (Drechsler–Sterz 1999); five conics: 3264 (Chasles 1864; Bashelor–Ksir–Traves 2008).

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

interface SolutionsDoc {
  coordinates: string[];
  unknowns: string[];
  instances: { id: string; solutions: { values: Record<string, [number, number]>; certified: boolean; certificate: [number, number, number, number][] | null }[] }[];
}

/** The polynomial lines of each instance block of system.txt, by instance id. */
function systemBlocks(text: string): Map<string, string[]> {
  const blocks = new Map<string, string[]>();
  let current: string[] | null = null;
  for (const line of text.split('\n')) {
    const head = /^# Instance "([a-z0-9-]+)"/.exec(line);
    if (head) { current = []; blocks.set(head[1]!, current); } else if (line && !line.startsWith('#')) current?.push(line);
  }
  return blocks;
}

describe.each([['Apollonius', APOLLONIUS, 8], ['five conics', FIVE_CONICS, 3264]])('%s downloads', (_, path, count) => {
  it('give compact JSON with every solution and, beside each, the box that certifies it', async () => {
    const page = await site.open(path);
    const href = await page.locator('a[href$="solutions.json"]').first().getAttribute('href');
    const raw = await page.evaluate(`fetch(${JSON.stringify(href)}).then((r) => r.text())`) as string;
    expect(raw.split('\n').length).toBeLessThanOrEqual(2);
    const doc = JSON.parse(raw) as SolutionsDoc;
    for (const inst of doc.instances) {
      expect(inst.solutions).toHaveLength(count);
      for (const s of inst.solutions) {
        expect(Object.keys(s.values)).toEqual(doc.coordinates);
        if (s.certified) expect(s.certificate).toHaveLength(doc.unknowns.length);
      }
    }
    await page.close();
  });

  it('give the polynomial system as text that parses and vanishes at the centre of every certificate box', async () => {
    const page = await site.open(path);
    const system = await page.evaluate(`fetch(${JSON.stringify(`${path}system.txt`)}).then((r) => r.text())`) as string;
    const doc = JSON.parse(await page.evaluate(`fetch(${JSON.stringify(`${path}solutions.json`)}).then((r) => r.text())`) as string) as SolutionsDoc;
    const blocks = systemBlocks(system);
    expect([...blocks.keys()].sort()).toEqual(doc.instances.map((i) => i.id).sort());
    for (const inst of doc.instances) {
      const equations = blocks.get(inst.id)!;
      expect(equations).toHaveLength(doc.unknowns.length);
      // Every box of Apollonius; every 40th of the 3264 five-conic boxes (the check is the same for all).
      const boxes = inst.solutions.map((s) => s.certificate).filter((b): b is [number, number, number, number][] => b !== null);
      for (const box of boxes.filter((_, k) => k % (count > 100 ? 40 : 1) === 0)) {
        const values = Object.fromEntries(doc.unknowns.map((u, j) => [u, new Complex((box[j]![0] + box[j]![1]) / 2, (box[j]![2] + box[j]![3]) / 2)]));
        // The box holds a true zero within ~1e-10 (relative); at its centre each polynomial is that small against its terms.
        for (const eq of equations) expect(evaluatePlain(eq, values).abs() / evaluatePlain(eq, values, true).re).toBeLessThan(1e-9);
      }
    }
    await page.close();
  });
});

describe('copy buttons', () => {
  it('copy the citation, the BibTeX entries and the equations to the clipboard', async () => {
    const page = await site.open(APOLLONIUS, { permissions: ['clipboard-read', 'clipboard-write'] });
    const clipboard = () => page.evaluate('navigator.clipboard.readText()') as Promise<string>;
    const cases: [string, RegExp][] = [
      ['.cite button.copy-button >> nth=0', /^Enumerative Atlas contributors\. “Circles tangent to three circles\.”/],
      ['.cite details[open] button.copy-button', /^@misc\{enumatlas:circles-tangent-to-three-circles:v\d+,/],
    ];
    for (const [selector, want] of cases) {
      await page.locator(selector).first().click();
      await expect.poll(clipboard).toMatch(want);
    }
    await page.locator('.source details summary').click();
    await page.locator('.source details button.copy-button').click();
    await expect.poll(clipboard).toMatch(/^@article\{drechsler1999,/);
    await page.locator('details.system summary').first().click();
    await page.locator('details.system button.copy-button').first().click();
    await expect.poll(clipboard).toMatch(/^[^#].*\n.*\n.*\n$/);
    expect(await page.locator('details.system button.copy-button .copy-done').first().textContent()).toBe('Copied');
    await page.close();
  });

  it('copy a long system by fetching it (the five-conic equations)', async () => {
    const page = await site.open(FIVE_CONICS, { permissions: ['clipboard-read', 'clipboard-write'] });
    await page.locator('details.system summary').first().click();
    await page.locator('details.system button.copy-button').first().click();
    await expect.poll(() => page.evaluate('navigator.clipboard.readText().then((t) => t.split("\\n").length)'), { timeout: 10_000 }).toBe(7);
    await page.close();
  });
});
