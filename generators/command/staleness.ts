import { existsSync, readFileSync } from 'node:fs';
import { parseRecord } from '../../src/atlas/read-record.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';
import type { LoadedDefinition } from '../pipeline/load-definition.ts';
import { recordPath } from '../write/content-paths.ts';

/**
 * Why a problem's published record is stale, or null when it is fresh (the published record is returned then).
 * Stale means: no record, an unreadable record, a different definition hash, or a different engine version.
 */
export function staleness(root: string, loaded: LoadedDefinition, engineVersion: string): { reason: string } | { record: SolveRecord } {
  const file = recordPath(root, loaded.definition.slug);
  if (!existsSync(file)) return { reason: 'no record yet' };
  const parsed = parseRecord(readFileSync(file, 'utf8'));
  if (!parsed.ok) return { reason: 'record unreadable' };
  if (parsed.value.definitionHash !== loaded.hash) return { reason: 'definition changed' };
  if (parsed.value.engineVersion !== engineVersion) return { reason: `engine ${parsed.value.engineVersion} → ${engineVersion}` };
  return { record: parsed.value };
}
