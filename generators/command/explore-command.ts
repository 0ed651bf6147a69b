import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';
import { explorationSchema } from '../../src/atlas/exploration.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { instanceParameters, runEngine } from '../pipeline/solve-problem.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { loadTarget } from '../pipeline/registry.ts';
import { roundNumbers } from '../pipeline/round-numbers.ts';
import { strategyFor } from '../pipeline/strategy-for.ts';
import { exploreRealCounts } from '../explore/explore-real-counts.ts';
import { writeFileAtomic } from '../write/atomic-write.ts';
import { contentRoot, explorationPath } from '../write/content-paths.ts';
import type { CommandContext } from './context.ts';
import { EXIT } from './exit-codes.ts';
import { integerOption, parseOptions } from './parse-options.ts';
import { createProgress } from './progress.ts';

const USAGE = 'explore <slug | path/to/definition.ts> [--samples N] [--climb N] [--seed N] [--content DIR]';
/** Defaults: random real instances, climb steps, seed (recorded in the file). */
const DEFAULTS = { samples: 100, climb: 60, seed: 1 };

/**
 * `explore`: solves the problem's generic instance, carries its solutions to random real instances and climbs toward
 * more real solutions (generators/explore), with progress and ETA; writes content/explorations/<slug>.json (canonical
 * JSON, same seed ⇒ same bytes). Refuses a generic set that falls short of the published count.
 */
export async function exploreCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values, positionals } = parseOptions(args, { samples: { type: 'string' }, climb: { type: 'string' }, seed: { type: 'string' } }, USAGE);
  if (positionals.length !== 1) throw new AtlasError('input', `explore takes one problem, got ${positionals.length}\nusage: ${USAGE}`);
  const samples = integerOption(values.samples, 'samples', 1) ?? DEFAULTS.samples;
  const climbSteps = integerOption(values.climb, 'climb') ?? DEFAULTS.climb;
  const seed = integerOption(values.seed, 'seed') ?? DEFAULTS.seed;
  const loaded = await loadTarget(positionals[0]!, ctx.problemsDir);
  const generic = loaded.definition.instances.find((i) => i.kind === 'generic');
  if (!generic) throw new AtlasError('input', `${displayPath(loaded.file)}: instances: no generic instance to explore from`);
  const where = `${displayPath(loaded.file)}: instance "${generic.id}"`;
  const services = await ctx.loadEngine();
  const parameters = instanceParameters(loaded, generic);
  const report = await runEngine(where, () => strategyFor(loaded.definition, services, displayPath(loaded.file)).solve(loaded.system, parameters, { seed: generic.seed }, loaded.definition));
  const expected = loaded.definition.trueCount.value;
  if (expected !== null && report.solutions.length !== expected) {
    throw new AtlasError('solve', `${where}: found ${report.solutions.length} of ${expected}; the explorer needs the whole generic solution set`);
  }
  const engine = await import('../../src/engine/index.ts');
  const progress = createProgress(ctx.stderr, ctx.now, 'instances');
  progress.start(`${loaded.definition.slug} explore`);
  const exploration = await runEngine(where, () => exploreRealCounts(engine, loaded, {
    samples, climbSteps, seed, engineVersion: services.version,
    generic: { parameters, solutions: report.solutions.map((s) => s.point) },
    onProgress: (done, total) => progress.update(done, total),
  }));
  progress.finish();
  const checked = explorationSchema.parse(roundNumbers(exploration));
  const path = explorationPath(contentRoot(values.content), checked.slug);
  mkdirSync(dirname(path), { recursive: true });
  writeFileAtomic(path, canonicalJson(checked));
  ctx.stdout.write(`${checked.slug}: ${samples} real instances (${checked.incompleteSamples} incomplete), real counts ${checked.distribution.map((d) => `${d.real}×${d.samples}`).join(', ')}; best ${checked.best.real} of ${checked.degree} (${checked.best.origin}); wrote ${path}\n`);
  return EXIT.ok;
}
