import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, it } from 'vitest';
import { parseRecord } from '../../../src/atlas/read-record.ts';
import { pageFrontmatterSchema } from '../../../src/atlas/page-frontmatter.ts';
import { readFrontmatter } from '../../../generators/write/render-page.ts';
import { pagePath, recordPath } from '../../../generators/write/content-paths.ts';

const CHILD = new URL('./fixtures/publish-forever.ts', import.meta.url).pathname;

/** Starts the child that republishes forever, kills it with SIGKILL `delayMs` after it is ready. */
function killMidWrite(root: string, delayMs: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--experimental-strip-types', CHILD, root], { stdio: ['ignore', 'pipe', 'pipe'] });
    let err = '';
    child.stderr.on('data', (d) => (err += d));
    child.stdout.once('data', () => setTimeout(() => child.kill('SIGKILL'), delayMs));
    child.on('exit', (_code, signal) => (signal === 'SIGKILL' ? resolve() : reject(new Error(`child ended without the kill: ${err}`))));
  });
}

describe('a regeneration killed with SIGKILL in the middle of a stream of writes', () => {
  it.concurrent.for([40, 110, 230])('%i ms in, leaves the record readable and schema-valid and the page with valid frontmatter', async (delayMs, { expect }) => {
    const root = mkdtempSync(join(tmpdir(), 'atlas-kill-'));
    await killMidWrite(root, delayMs);
    const record = parseRecord(readFileSync(recordPath(root, 'two-test-conics'), 'utf8'));
    expect(record.ok, JSON.stringify(!record.ok && record.issues)).toBe(true);
    const front = pageFrontmatterSchema.safeParse(readFrontmatter(readFileSync(pagePath(root, 'two-test-conics'), 'utf8')));
    expect(front.success).toBe(true);
    // Left-over temporary files are dot-files ending in .tmp, which no reader globs (*.json, *.mdx).
    for (const dir of ['records', 'problems']) {
      for (const name of readdirSync(join(root, dir))) expect(name).toMatch(/^(two-test-conics\.(json|mdx)|\..*\.tmp)$/);
    }
  });
});
