import { runLayout } from './run-layout.ts';
import type { RunPlan } from './run-plan.ts';
import { shellLine, shellQuote } from './shell-quote.ts';

/**
 * The bash script of the dependent merge job: `merge` over every part of the run, keeping the merged record in the
 * run folder and publishing it into the plan's content root (through the regression guard, --force if asked), or
 * not publishing at all when the plan says so. Writes `merge-exit` (the exit code) last, atomically.
 */
export function mergeScript(plan: RunPlan): string {
  const layout = runLayout(plan.dir);
  const merge = [plan.node, '--experimental-strip-types', 'generators/cli.ts', 'merge'];
  const options = [
    '--record-file', layout.record,
    ...(plan.publishTo === null ? ['--unpublished'] : ['--content', plan.publishTo]),
    ...(plan.force ? ['--force'] : []),
  ];
  return `#!/bin/bash
# Merges the ${plan.shards} parts of ${plan.slug} into its record, as a single run would; runs after every batch succeeded.
set -u
cd ${shellQuote(plan.project)} && ${shellLine(merge)} ${shellQuote(layout.parts)}/part-*.json ${shellLine(options)}
code=$?
echo "$code" > ${shellQuote(`${layout.mergeExit}.tmp`)} && mv ${shellQuote(`${layout.mergeExit}.tmp`)} ${shellQuote(layout.mergeExit)}
exit "$code"
`;
}
