import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { SolveRecord } from '../../src/atlas/record.ts';
import { certificatesFileSchema, systemsFileSchema } from '../../src/atlas/sidecars.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { certificatesPath, systemsPath } from './content-paths.ts';

/**
 * Checks the files beside the records (content/systems/, content/certificates/): each parses and fits its schema,
 * belongs to a record, and agrees with it (same instances in the same order, one equation per equation degree in the
 * formulation's unknowns, one box or null per solution, four numbers per unknown in each box). Missing files are
 * fine (records written before them); returns one message per problem found.
 */
export function checkSidecars(root: string, records: ReadonlyMap<string, SolveRecord>): string[] {
  const errors: string[] = [];
  const check = (folder: string, path: (root: string, slug: string) => string, agree: (data: unknown, record: SolveRecord) => string | null) => {
    const dir = join(root, folder);
    if (!existsSync(dir)) return;
    for (const name of readdirSync(dir).filter((n) => n.endsWith('.json')).sort()) {
      const slug = name.slice(0, -'.json'.length);
      const file = displayPath(path(root, slug));
      const record = records.get(slug);
      if (!record) { errors.push(`${file}: has no record`); continue; }
      let data: unknown;
      try { data = JSON.parse(readFileSync(path(root, slug), 'utf8')); } catch (error) { errors.push(`${file}: not JSON: ${(error as Error).message}`); continue; }
      const why = agree(data, record);
      if (why) errors.push(`${file}: ${why}`);
    }
  };
  const ids = (r: SolveRecord) => r.instances.map((i) => i.id).join(', ');
  check('systems', systemsPath, (data, record) => {
    const parsed = systemsFileSchema.safeParse(data);
    if (!parsed.success) return `${parsed.error.issues[0]!.path.join('.')}: ${parsed.error.issues[0]!.message}`;
    const s = parsed.data;
    if (s.slug !== record.slug) return `slug: "${s.slug}" does not match the file name`;
    if (s.unknowns.join() !== record.formulation.unknowns.join()) return `unknowns: [${s.unknowns.join(', ')}] are not the formulation's [${record.formulation.unknowns.join(', ')}]`;
    if (s.instances.map((i) => i.id).join(', ') !== ids(record)) return `instances: [${s.instances.map((i) => i.id).join(', ')}] are not the record's [${ids(record)}]`;
    const bad = s.instances.find((i) => i.equations.length !== record.formulation.equationDegrees.length);
    return bad ? `instances.${bad.id}.equations: ${bad.equations.length} equations for ${record.formulation.equationDegrees.length} in the formulation` : null;
  });
  check('certificates', certificatesPath, (data, record) => {
    const parsed = certificatesFileSchema.safeParse(data);
    if (!parsed.success) return `${parsed.error.issues[0]!.path.join('.')}: ${parsed.error.issues[0]!.message}`;
    const c = parsed.data;
    if (c.slug !== record.slug) return `slug: "${c.slug}" does not match the file name`;
    if (c.instances.map((i) => i.id).join(', ') !== ids(record)) return `instances: [${c.instances.map((i) => i.id).join(', ')}] are not the record's [${ids(record)}]`;
    for (const [k, inst] of c.instances.entries()) {
      const solutions = record.instances[k]!.solutions.length;
      if (inst.boxes.length !== solutions) return `instances.${inst.id}.boxes: ${inst.boxes.length} boxes for ${solutions} solutions`;
      const j = inst.boxes.findIndex((b) => b !== null && b.length !== c.unknowns.length);
      if (j >= 0) return `instances.${inst.id}.boxes[${j}]: ${inst.boxes[j]!.length} intervals for ${c.unknowns.length} unknowns`;
    }
    return null;
  });
  return errors;
}
