import type { CarriedSolutions, Certifier } from '../../src/engine/index.ts';

/**
 * The certified real count of a carried solution set at real parameters, or null when the set is not complete: a
 * route failed or jumped, or some solution was not certified distinct (Krawczyk's test). Nothing is guessed.
 */
export function certifiedRealCount(certifier: Certifier, parameters: Float64Array, carried: CarriedSolutions): number | null {
  if (carried.points.some((x) => x === null)) return null;
  const report = certifier.certify(parameters, carried.points as Float64Array[], { realParameters: true });
  return report.certifiedDistinct === carried.points.length ? report.certifiedReal : null;
}
