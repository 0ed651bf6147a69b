import { describe, expect, it } from 'vitest';
import { parseBenchArguments } from '../../../generators/bench/bench-arguments.ts';
import { formatTable } from '../../../generators/bench/bench-table.ts';

describe('bench command line', () => {
  it('defaults to 5 runs and a table', () => {
    expect(parseBenchArguments([])).toEqual({ runs: 5, json: false });
  });
  it('reads --runs, --only and --json', () => {
    expect(parseBenchArguments(['--runs', '2', '--only', 'conics', '--json'])).toEqual({ runs: 2, only: 'conics', json: true });
  });
  it.each([[['--runs', '0']], [['--runs', 'x']], [['--only']], [['--fast']]])('names the bad argument in %j', (argv) => {
    expect(() => parseBenchArguments(argv)).toThrow(/--runs|--only|unknown bench argument/);
  });
  it('prints medians and found/expected in the table', () => {
    const table = formatTable([{ name: 'case', cores: 2, runs: 3, seconds: [3, 1, 2], paths: 10, found: 4, expected: 4, failedPaths: 0, steps: [1, 5, 3] }]);
    expect(table).toContain('2.000');
    expect(table).toContain('4/4');
    expect(table).toMatch(/\b3\b.*\b5\b/);
  });
});
