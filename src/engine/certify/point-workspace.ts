import type { CertifiableSystem } from './certifiable-system.ts';
import { createKrawczykTester, type KrawczykTester } from './krawczyk.ts';

/**
 * The buffers one point certification works in, made once per system and reused for every point (no allocation
 * per point beyond the returned boxes): F and J at a point, Y ≈ J⁻¹, the Newton step, the centre m and box X,
 * F(m) as an interval, per-coordinate radii, and Krawczyk's tester.
 */
export interface PointWorkspace {
  readonly system: CertifiableSystem;
  readonly n: number;
  readonly tester: KrawczykTester;
  readonly values: Float64Array;
  readonly jacobian: Float64Array;
  readonly inverse: Float64Array;
  readonly step: Float64Array;
  readonly centre: Float64Array;
  readonly box: Float64Array;
  readonly centreBox: Float64Array;
  readonly centreValues: Float64Array;
  readonly radii: Float64Array;
}

/** Allocates the workspace for a compiled system. */
export function createPointWorkspace(system: CertifiableSystem): PointWorkspace {
  const n = system.size;
  return {
    system, n, tester: createKrawczykTester(system),
    values: new Float64Array(2 * n), jacobian: new Float64Array(2 * n * n), inverse: new Float64Array(2 * n * n),
    step: new Float64Array(2 * n), centre: new Float64Array(2 * n), box: new Float64Array(4 * n),
    centreBox: new Float64Array(4 * n), centreValues: new Float64Array(4 * n), radii: new Float64Array(n),
  };
}
