/** Path counts of a completeness check; they add up over its stages. */
export interface PathCounts {
  /** Paths tracked (one per point per leg, safe re-tracks included). */
  readonly paths: number;
  /** Paths (or routes) that ended without a regular end: counted, never dropped silently. */
  readonly failedPaths: number;
  /** Paths re-tracked with safe settings because their ends met another's (path jumps). */
  readonly jumps: number;
  /** Jumps that the safe re-track did not resolve: those ends were not believed. */
  readonly unresolvedJumps: number;
}
