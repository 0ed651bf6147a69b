import type { PolynomialSystem } from '../expr/node.ts';
import { compileCertifiableSystem, type CertifiableSystem } from './certifiable-system.ts';
import { createPointCertifier, type PointCertificate, type PointCertifierOptions } from './certify-point.ts';
import { settleDistinct } from './settle-distinct.ts';
import type { CertificationReport, CertifiedSolution } from './certification-report.ts';

export type { CertificationReport, CertifiedSolution } from './certification-report.ts';

/** Options: realParameters (default: every parameter has imaginary part exactly 0), and the point certifier's tuning. */
export interface CertifyOptions extends PointCertifierOptions {
  realParameters?: boolean;
}

/** A system compiled once, ready to certify solution sets of many instances. */
export interface Certifier {
  readonly system: CertifiableSystem;
  /** Certifies every point (packed complex approximate solutions) for the given packed complex parameters. */
  certify(parameters: Float64Array, points: readonly Float64Array[], options?: CertifyOptions): CertificationReport;
  /** Krawczyk's test once on a given box (4n) for the given parameters: true proves exactly one solution inside. */
  holdsOneSolution(parameters: Float64Array, box: Float64Array): boolean;
}

/** Decides whether the instance is real; throws naming the parameter when realParameters is claimed but false. */
export function realInstance(realConstants: boolean, parameters: Float64Array, claimed: boolean | undefined): boolean {
  if (claimed === false) return false;
  for (let k = 1; k < parameters.length; k += 2) {
    if (parameters[k] !== 0) {
      if (claimed) throw new RangeError(`realParameters was set but parameter ${k >> 1} has imaginary part ${parameters[k]}`);
      return false;
    }
  }
  return realConstants;
}

/** Compiles the system once (throws a RangeError naming the sizes when it is not square). */
export function prepareCertifier(polynomialSystem: PolynomialSystem): Certifier {
  const system = compileCertifiableSystem(polynomialSystem);
  const n = system.size;
  let plain: ReturnType<typeof createPointCertifier> | null = null;
  return {
    system,
    holdsOneSolution(parameters, box) {
      system.setParameters(parameters);
      plain ??= createPointCertifier(system);
      return plain.hull(box);
    },
    certify(parameters, points, options = {}) {
      const started = performance.now();
      system.setParameters(parameters);
      const real = realInstance(system.realConstants, parameters, options.realParameters);
      const certifier = createPointCertifier(system, options);
      const results: PointCertificate[] = points.map((x, i) => {
        if (x.length !== 2 * n) throw new RangeError(`solution ${i} has ${x.length} numbers, expected ${2 * n} (packed complex)`);
        return certifier.point(x, real);
      });
      return settleDistinct(results, n, certifier.hull, (performance.now() - started) / 1000);
    },
  };
}

/** Certifies approximate solutions of one instance (compiles the system; use prepareCertifier to compile once). */
export function certifySolutions(
  system: PolynomialSystem,
  parameters: Float64Array,
  points: Float64Array[],
  options?: CertifyOptions,
): CertificationReport {
  return prepareCertifier(system).certify(parameters, points, options);
}
