import type { SolveRecord } from '../atlas/record.ts';
import type { CertificatesFile } from '../atlas/sidecars.ts';
import { instancesInPageOrder } from './ladder.ts';

/**
 * The downloadable solution set of a record: every instance's parameters and solutions, keyed by coordinate name,
 * and beside each solution its certificate (the Krawczyk box in the formulation's unknowns, or null) when the
 * certificates file is given. Throws when that file and the record disagree on an instance or its solution count.
 */
export function solutionsDocument(record: SolveRecord, recordVersion: number, certificates: CertificatesFile | null = null) {
  const boxesOf = (id: string, count: number) => {
    if (!certificates) return null;
    const boxes = certificates.instances.find((c) => c.id === id)?.boxes;
    if (!boxes || boxes.length !== count) throw new Error(`certificates/${record.slug}.json: instance "${id}" has ${boxes?.length ?? 'no'} boxes for ${count} solutions`);
    return boxes;
  };
  return {
    slug: record.slug,
    title: record.title,
    recordVersion,
    engineVersion: record.engineVersion,
    coordinates: [...record.coordinates],
    ...(certificates ? { unknowns: [...certificates.unknowns] } : {}),
    note: 'Complex values are [re, im]. Residual: ‖F(x)‖∞ / (1 + ‖x‖∞). Condition: null when the Jacobian is singular.' +
      (certificates ? ' Certificate: the box, [reLo, reHi, imLo, imHi] per unknown of system.txt, on which Krawczyk\'s test proved exactly one solution (outward rounding); null when not certified.' : ''),
    instances: instancesInPageOrder(record).map((inst) => ({
      id: inst.id,
      kind: inst.kind,
      label: inst.label,
      seed: inst.seed,
      parameters: inst.parameters,
      solutions: inst.solutions.map((s, index, all) => ({
        index,
        values: Object.fromEntries(record.coordinates.map((name, k) => [name, s.values[k] ?? null])),
        residual: s.residual,
        condition: s.condition,
        multiplicity: s.multiplicity,
        real: s.real,
        certified: s.certified,
        certifiedReal: s.certifiedReal,
        ...(certificates ? { certificate: boxesOf(inst.id, all.length)![index] ?? null } : {}),
      })),
    })),
  };
}

/** Quotes a CSV field when it holds a comma, quote or line break (RFC 4180). */
export function csvField(value: string | number | boolean | null): string {
  const text = value === null ? '' : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The solution set as CSV (RFC 4180, CRLF line ends): one row per solution, re and im columns per coordinate. */
export function solutionsCsv(record: SolveRecord): string {
  const header = ['instance', 'index', ...record.coordinates.flatMap((n) => [`${n}_re`, `${n}_im`]),
    'residual', 'condition', 'multiplicity', 'real', 'certified', 'certified_real'];
  const rows = instancesInPageOrder(record).flatMap((inst) =>
    inst.solutions.map((s, index) => {
      if (s.values.length !== record.coordinates.length) {
        throw new Error(`record "${record.slug}", instance "${inst.id}", solution ${index}: ${s.values.length} values for ${record.coordinates.length} coordinates`);
      }
      return [inst.id, index, ...s.values.flat(), s.residual, s.condition, s.multiplicity, s.real, s.certified, s.certifiedReal];
    }),
  );
  return [header, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}
