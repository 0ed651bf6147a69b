import type { Sink } from './context.ts';

/**
 * Progress on stderr (of path tracking by default, else of the given unit): on a terminal one line rewritten with \r (paths done, percent, ETA from the
 * mean rate so far, at most 10 updates a second); otherwise a plain line at every 10 % step. `finish` ends the line.
 */
export function createProgress(sink: Sink, now: () => number, unit = 'paths') {
  let label = '';
  let started = 0;
  let lastDraw = 0;
  let lastDecile = -1;
  return {
    start(text: string): void {
      label = text;
      started = now();
      lastDraw = 0;
      lastDecile = -1;
    },
    update(done: number, total: number): void {
      const t = now();
      const fraction = total > 0 ? done / total : 1;
      if (sink.isTTY) {
        if (t - lastDraw < 100 && done < total) return;
        lastDraw = t;
        const eta = done > 0 && done < total ? ` · ETA ${duration(((t - started) / done) * (total - done))}` : '';
        sink.write(`\r${label}: ${done}/${total} ${unit} (${Math.floor(fraction * 100)}%)${eta}\u001b[K`);
      } else {
        const decile = Math.floor(fraction * 10);
        if (decile === lastDecile) return;
        lastDecile = decile;
        sink.write(`${label}: ${done}/${total} ${unit} (${Math.floor(fraction * 100)}%)\n`);
      }
    },
    finish(): void {
      if (sink.isTTY && lastDraw > 0) sink.write('\n');
    },
  };
}

/** Milliseconds as "1h 02m", "3m 04s" or "12s". */
export function duration(ms: number): string {
  const s = Math.max(0, Math.round(ms / 1000));
  if (s >= 3600) return `${Math.floor(s / 3600)}h ${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}m`;
  if (s >= 60) return `${Math.floor(s / 60)}m ${String(s % 60).padStart(2, '0')}s`;
  return `${s}s`;
}
