import { parseArgs, type ParseArgsConfig } from 'node:util';
import { AtlasError } from '../pipeline/atlas-error.ts';

type Options = NonNullable<ParseArgsConfig['options']>;

/** Options every command accepts: --content DIR (content root) and --debug (stack traces on internal errors). */
export const COMMON_OPTIONS = {
  content: { type: 'string' },
  debug: { type: 'boolean' },
} as const satisfies Options;

/** node:util parseArgs in strict mode with positionals; a usage mistake becomes AtlasError('input') with the usage line. */
export function parseOptions<O extends Options>(args: readonly string[], options: O, usage: string) {
  try {
    return parseArgs({ args: [...args], options: { ...COMMON_OPTIONS, ...options }, allowPositionals: true, strict: true });
  } catch (error) {
    throw new AtlasError('input', `${error instanceof Error ? error.message : String(error)}\nusage: ${usage}`);
  }
}

/** A non-negative integer option (undefined when absent); AtlasError('input') naming the option otherwise. */
export function integerOption(value: string | boolean | undefined, name: string, min = 0): number | undefined {
  if (value === undefined) return undefined;
  const n = typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n) || n < min) throw new AtlasError('input', `--${name}: must be an integer ≥ ${min}, got ${JSON.stringify(value)}`);
  return n;
}

/** Parses `--shard k/n` (1 ≤ k ≤ n) into a 0-based batch index and count. */
export function shardOption(value: string | undefined): { index: number; count: number } | undefined {
  if (value === undefined) return undefined;
  const m = /^(\d+)\/(\d+)$/.exec(value);
  const k = m ? Number(m[1]) : NaN, n = m ? Number(m[2]) : NaN;
  if (!(k >= 1 && n >= 1 && k <= n)) throw new AtlasError('input', `--shard: must be k/n with 1 ≤ k ≤ n (batch k of n), got ${JSON.stringify(value)}`);
  return { index: k - 1, count: n };
}
