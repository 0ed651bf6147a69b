import type { Vector3 } from './vector3.ts';

/** Denavit–Hartenberg data of a 6R arm: cos and sin of the five twists αᵢ, the five lengths aᵢ and the six offsets dᵢ. */
export interface ArmData {
  readonly cosTwist: readonly number[];
  readonly sinTwist: readonly number[];
  readonly length: readonly number[];
  readonly offset: readonly number[];
}

/** The arm data named l1…l5, m1…m5, a1…a5, d1…d6 in a parameter record (real parts). */
export function armOf(p: Readonly<Record<string, number>>): ArmData {
  const five = [1, 2, 3, 4, 5];
  return {
    cosTwist: five.map((i) => p[`l${i}`]!),
    sinTwist: five.map((i) => p[`m${i}`]!),
    length: five.map((i) => p[`a${i}`]!),
    offset: [...five, 6].map((i) => p[`d${i}`]!),
  };
}

const cross = (a: Vector3, b: Vector3): Vector3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];

/**
 * The six joint axes z₁ … z₆ of a posture stored as (c₁, s₁, z₃, z₄, z₅) (real), with z₁ = (0, 0, 1),
 * z₂ = (μ₁s₁, −μ₁c₁, λ₁) and z₆ the tool axis w.
 */
export function axesOf(values: readonly number[], arm: ArmData, toolAxis: Vector3): Vector3[] {
  const [c1, s1] = [values[0]!, values[1]!];
  const z = (k: number): Vector3 => [values[2 + 3 * k]!, values[3 + 3 * k]!, values[4 + 3 * k]!];
  return [[0, 0, 1], [arm.sinTwist[0]! * s1, -arm.sinTwist[0]! * c1, arm.cosTwist[0]!], z(0), z(1), z(2), toolAxis];
}

/** The common normals xᵢ = zᵢ × zᵢ₊₁ / μᵢ (i = 1 … 5) between consecutive axes. */
export function normalsOf(axes: readonly Vector3[], arm: ArmData): Vector3[] {
  return [0, 1, 2, 3, 4].map((i) => cross(axes[i]!, axes[i + 1]!).map((v) => v / arm.sinTwist[i]!) as Vector3);
}

/**
 * The arm's skeleton from the base origin to the tool point: alternately the offset dᵢ along axis i and the length
 * aᵢ along the common normal xᵢ, so 12 points (origin, then the foot of each normal and the next axis's point, then
 * the tool point). The last point equals the tool point exactly when the posture solves the position equations.
 */
export function skeletonOf(axes: readonly Vector3[], arm: ArmData): Vector3[] {
  const normals = normalsOf(axes, arm);
  const points: Vector3[] = [[0, 0, 0]];
  const step = (v: Vector3, t: number) => { const last = points[points.length - 1]!; points.push([last[0] + t * v[0], last[1] + t * v[1], last[2] + t * v[2]]); };
  for (let i = 0; i < 6; i++) {
    step(axes[i]!, arm.offset[i]!);
    if (i < 5) step(normals[i]!, arm.length[i]!);
  }
  return points;
}

/**
 * The joint angles (cos θᵢ, sin θᵢ) of a posture from its axes and the tool's x-axis: θ₁ from the base x-axis
 * (1, 0, 0) to x₁, θᵢ from xᵢ₋₁ to xᵢ about zᵢ for i = 2 … 5, and θ₆ from x₅ to the tool x-axis about z₆.
 */
export function jointAnglesOf(axes: readonly Vector3[], arm: ArmData, toolX: Vector3): [number, number][] {
  const normals: Vector3[] = [[1, 0, 0], ...normalsOf(axes, arm), toolX];
  const dot = (a: Vector3, b: Vector3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  return [0, 1, 2, 3, 4, 5].map((i) => [dot(normals[i]!, normals[i + 1]!), dot(cross(normals[i]!, normals[i + 1]!), axes[i]!)]);
}
