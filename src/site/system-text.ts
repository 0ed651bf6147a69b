import type { SolveRecord } from '../atlas/record.ts';
import type { SystemsFile } from '../atlas/sidecars.ts';
import { instancesInPageOrder } from './ladder.ts';

/** The header lines that explain the plain notation, shared by every system file. */
export const NOTATION_LINES = [
  'Plain notation: one polynomial per line; the system is "each polynomial = 0".',
  '* multiplies, ^ raises to a power, I is the imaginary unit; decimals are exact binary64 values (the coefficients',
  'were expanded in binary64 from the exact parameters, a few units in the last place each). Lines starting with # are comments.',
];

/**
 * The systems download of a record: comment lines naming the problem, permanent address, record and engine versions
 * and the notation, then per instance (page order) its label, its exact parameters and one polynomial per line.
 * Throws when the systems file lacks an instance of the record.
 */
export function systemText(record: SolveRecord, systems: SystemsFile, url: string, recordVersion: number): string {
  const lines = [
    `# Enumerative Atlas: ${record.title}`,
    `# ${url} · record version ${recordVersion} · engine ${record.engineVersion}`,
    ...NOTATION_LINES.map((l) => `# ${l}`),
    `# Unknowns: ${systems.unknowns.join(', ')}`,
  ];
  for (const inst of instancesInPageOrder(record)) {
    const sys = systems.instances.find((s) => s.id === inst.id);
    if (!sys) throw new Error(`systems/${record.slug}.json has no instance "${inst.id}"`);
    lines.push('#', `# Instance "${inst.id}" (${inst.kind}): ${inst.label}`);
    const params = Object.entries(sys.parameters).map(([name, [re, im]]) => `${name} = ${im === 0 ? re : `${re} ${im < 0 ? '-' : '+'} ${Math.abs(im)}*I`}`);
    if (params.length > 0) lines.push(`# Parameters substituted: ${params.join(', ')}`);
    lines.push(...sys.equations);
  }
  return `${lines.join('\n')}\n`;
}

/** One instance's polynomials alone, one per line (for copying), or null when the systems file lacks the instance. */
export function instanceEquations(systems: SystemsFile, instance: string): string | null {
  const sys = systems.instances.find((s) => s.id === instance);
  return sys ? `${sys.equations.join('\n')}\n` : null;
}
