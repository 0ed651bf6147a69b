import { describe, expect, it } from 'vitest';
import { createProgress, duration } from '../../../generators/command/progress.ts';
import { buffer } from './command-context.ts';

describe('progress on stderr', () => {
  it('rewrites one line with an ETA on a terminal', () => {
    const sink = buffer(true);
    let t = 0;
    const progress = createProgress(sink, () => t);
    progress.start('apollonius generic');
    t = 1000;
    progress.update(1, 4); // 1 s per path so far, 3 to go
    progress.finish();
    expect(sink.text).toBe('\rapollonius generic: 1/4 paths (25%) · ETA 3s\u001b[K\n');
  });

  it('prints plain lines only when a new tenth is reached (the first path, each tenth, the last)', () => {
    const sink = buffer(false);
    const progress = createProgress(sink, () => 0);
    progress.start('p');
    for (let done = 1; done <= 100; done++) progress.update(done, 100);
    expect(sink.text.split('\n').filter(Boolean)).toHaveLength(11);
    expect(sink.text).not.toContain('\r');
  });

  it.each([[999, '1s'], [61_000, '1m 01s'], [3_725_000, '1h 02m']])('writes %i ms as %s', (ms, text) => {
    expect(duration(ms)).toBe(text);
  });
});
