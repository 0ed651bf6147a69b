import type { Box, CertificatesFile, SystemsFile } from '../../src/atlas/sidecars.ts';
import type { PolynomialSystem } from '../../src/engine/index.ts';
import type { CertifyReport } from './engine-services.ts';
import { expandEquation, type Polynomial } from './expand-system.ts';
import { polynomialText } from './polynomial-text.ts';

/** What one instance adds to the files beside its record: its exact parameters, expanded equations and certificate boxes. */
export interface InstanceSidecar {
  readonly id: string;
  readonly parameters: Record<string, [number, number]>;
  readonly equations: string[];
  readonly boxes: (Box | null)[];
}

/** The files beside a record (content/systems/, content/certificates/), as data. */
export interface ProblemSidecars { readonly systems: SystemsFile; readonly certificates: CertificatesFile }

/** A packed box (4 numbers per unknown: reLo, reHi, imLo, imHi) as [[reLo, reHi, imLo, imHi], …]; null for none. */
export function boxOf(packed: Float64Array | undefined, unknowns: number): Box | null {
  if (!packed || packed.length !== 4 * unknowns) return null;
  return Array.from({ length: unknowns }, (_, j) => [packed[4 * j]!, packed[4 * j + 1]!, packed[4 * j + 2]!, packed[4 * j + 3]!] as [number, number, number, number]);
}

/**
 * An instance's sidecar: the system's equations expanded with the exact (unrounded) packed parameters substituted,
 * written in the plain notation over the system's unknowns, and each solution's certificate box from the verdict
 * (null where the test did not pass or the engine reports no box).
 */
export function instanceSidecar(id: string, system: PolynomialSystem, parameters: Float64Array, verdict: CertifyReport): InstanceSidecar {
  const n = system.unknowns.length;
  const memo = new Map<Parameters<typeof expandEquation>[0], Polynomial>();
  return {
    id,
    parameters: Object.fromEntries(system.parameters.map((name, j) => [name, [parameters[2 * j]!, parameters[2 * j + 1]!]])),
    equations: system.equations.map((e) => polynomialText(expandEquation(e, n, parameters, memo), system.unknowns)),
    boxes: verdict.solutions.map((s) => (s.certified ? boxOf(s.box, n) : null)),
  };
}

/** The two sidecar files of a problem from its instances' sidecars, in instance order. */
export function problemSidecars(slug: string, system: PolynomialSystem, instances: readonly InstanceSidecar[]): ProblemSidecars {
  const unknowns = [...system.unknowns];
  return {
    systems: { slug, unknowns, instances: instances.map(({ id, parameters, equations }) => ({ id, parameters, equations })) },
    certificates: { slug, unknowns, instances: instances.map(({ id, boxes }) => ({ id, boxes })) },
  };
}
