import { describe, expect, it } from 'vitest';
import { mergeScript } from '../../../generators/cluster/merge-script.ts';
import type { RunPlan } from '../../../generators/cluster/run-plan.ts';

const PLAN: RunPlan = { target: 't', slug: 't', shards: 2, dir: '/runs/r', project: '/atlas', node: '/bin/node', publishTo: '/atlas/content', force: false };

// What the merge job runs; common practice, no source.
describe('the merge script', () => {
  it.each([
    ['publishes into the content root', PLAN, "merge /runs/r/parts/part-*.json --record-file /runs/r/record.json --content /atlas/content\n"],
    ['publishes over a better record with --force', { ...PLAN, force: true }, "--content /atlas/content --force\n"],
    ['keeps the record in the run folder only', { ...PLAN, publishTo: null }, "--record-file /runs/r/record.json --unpublished\n"],
  ])('%s', (_name, plan, line) => {
    expect(mergeScript(plan)).toContain(line);
  });

  it('writes merge-exit last, through a rename', () => {
    const text = mergeScript(PLAN);
    expect(text).toContain('echo "$code" > /runs/r/merge-exit.tmp && mv /runs/r/merge-exit.tmp /runs/r/merge-exit\nexit "$code"');
  });
});
