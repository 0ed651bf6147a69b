/** true when ‖Im x‖∞ ≤ relTol · max(1, ‖x‖∞) for the packed complex point x (common practice, no source). */
export function isRealPoint(point: Float64Array, relTol = 1e-8): boolean {
  let size = 1, imag = 0;
  for (let i = 0; i < point.length; i += 2) {
    size = Math.max(size, Math.hypot(point[i]!, point[i + 1]!));
    imag = Math.max(imag, Math.abs(point[i + 1]!));
  }
  return imag <= relTol * size;
}
