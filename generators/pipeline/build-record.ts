import type { InstanceResult, SolveRecord, HistoryEntry } from '../../src/atlas/record.ts';
import { RECORD_SCHEMA_VERSION } from '../../src/atlas/record.ts';
import { degree } from '../../src/engine/index.ts';
import type { LoadedDefinition } from './load-definition.ts';

/** The solve record of a problem from its loaded definition, the engine version and its instances' results. */
export function buildRecord(loaded: LoadedDefinition, engineVersion: string, instances: InstanceResult[], history: HistoryEntry[] = []): SolveRecord {
  const d = loaded.definition;
  const f = d.formulation;
  return {
    schemaVersion: RECORD_SCHEMA_VERSION,
    slug: d.slug,
    title: d.title,
    family: d.family,
    tags: [...d.tags],
    statement: d.statement,
    excessNote: d.excessNote,
    caution: d.caution ?? null,
    ...(d.publishedGroup ? { publishedGroup: { ...d.publishedGroup } } : {}),
    trueCount: d.trueCount.value,
    source: d.trueCount.source,
    ...(d.ladders ? { ladders: d.ladders.map((l) => ({ ...l })) } : {}),
    formulation: {
      unknowns: [...f.unknowns],
      parameters: [...f.parameters],
      equationDegrees: loaded.system.equations.map((e) => degree(e)),
      groups: f.groups ? f.groups.map((g) => [...g]) : null,
      description: f.description,
    },
    coordinates: f.coordinates ? [...f.coordinates.names] : [...f.unknowns],
    engineVersion,
    definitionHash: loaded.hash,
    instances,
    history,
  };
}
