import type { PointCertificate } from './certify-point.ts';

/**
 * One approximate solution after certification. certified: Krawczyk's test passed on `box`, which therefore holds
 * exactly one true solution. certifiedReal: the box is symmetric about the real subspace and the system has real
 * coefficients (real parameters, real constants), so that solution is fixed by complex conjugation: its coordinates
 * *as given* (in the system's own chart, which may be a random complex one) are real. sameAs: the index of an
 * earlier solution proven to be the same one (their boxes overlap and the hull passed).
 */
export interface CertifiedSolution extends PointCertificate {
  /** Why not certified, or why not counted as distinct. */
  reason?: string;
  sameAs?: number;
}

/**
 * Counts: certified = boxes that passed; certifiedDistinct = groups of overlapping certified boxes (disjoint groups
 * hold different solutions, so this is a proven lower bound on the number of distinct solutions); certifiedReal =
 * such groups holding a real-certified box. seconds is wall time.
 */
export interface CertificationReport {
  solutions: CertifiedSolution[];
  certified: number;
  certifiedDistinct: number;
  certifiedReal: number;
  seconds: number;
}
