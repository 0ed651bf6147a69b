/** Bench command-line options. */
export interface BenchArguments {
  readonly runs: number;
  readonly only?: string;
  /** Only the suite file <suite>-suite.ts. */
  readonly suite?: string;
  readonly json: boolean;
}

/** Parses --runs N (positive integer, default 5), --only <substring>, --suite <name>, --json; throws naming a bad argument. */
export function parseBenchArguments(argv: readonly string[]): BenchArguments {
  let runs = 5, only: string | undefined, suite: string | undefined, json = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--json') json = true;
    else if (a === '--runs') {
      runs = Number(argv[++i]);
      if (!Number.isInteger(runs) || runs < 1) throw new RangeError(`--runs needs a positive integer, got ${argv[i]}`);
    } else if (a === '--only') {
      only = argv[++i];
      if (only === undefined) throw new RangeError('--only needs a substring of a case name');
    } else if (a === '--suite') {
      suite = argv[++i];
      if (suite === undefined) throw new RangeError('--suite needs a suite name (the file <name>-suite.ts)');
    } else throw new RangeError(`unknown bench argument ${a} (known: --runs N, --only <substring>, --suite <name>, --json)`);
  }
  return { runs, ...(only === undefined ? {} : { only }), ...(suite === undefined ? {} : { suite }), json };
}
