import { describe, expect, it } from 'vitest';
import { keepAlive } from '../../../src/engine/pool/keep-alive.ts';

// Common practice, no source: Node's Worker ref()/unref() are not counted, so a pool must count running jobs itself.
function fakeWorker() {
  const calls: string[] = [];
  return { calls, ref: () => calls.push('ref'), unref: () => calls.push('unref') };
}

describe('keeping a worker alive while it has jobs', () => {
  it.each([
    ['one job', ['hold', 'release'], ['unref', 'ref', 'unref'], 0],
    ['two overlapping jobs, first ends first', ['hold', 'hold', 'release', 'release'], ['unref', 'ref', 'unref'], 0],
    ['a job still running after another ends', ['hold', 'hold', 'release'], ['unref', 'ref'], 1],
    ['busy, idle, busy again', ['hold', 'release', 'hold'], ['unref', 'ref', 'unref', 'ref'], 1],
  ] as const)('%s', (_, steps, calls, active) => {
    const worker = fakeWorker();
    const alive = keepAlive(worker);
    for (const step of steps) alive[step]();
    expect(worker.calls).toEqual(calls);
    expect(alive.active).toBe(active);
  });

  it('refuses a release without a running job', () => {
    expect(() => keepAlive(fakeWorker()).release()).toThrow(/release\(\) without a running job/);
  });
});
