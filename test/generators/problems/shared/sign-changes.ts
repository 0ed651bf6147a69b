/**
 * The number of sign changes of f over the grid from..to in `steps` equal steps, skipping points where f is null
 * (outside its domain) without bridging a gap: a test helper that counts real roots of a one-parameter scan.
 */
export function signChangesAlong(f: (t: number) => number | null, from: number, to: number, steps: number): number {
  let changes = 0;
  let previous: number | null = null;
  for (let k = 0; k <= steps; k++) {
    const value = f(from + ((to - from) * k) / steps);
    if (value !== null && previous !== null && Math.sign(value) !== Math.sign(previous)) changes++;
    previous = value;
  }
  return changes;
}
