import type { ArmData } from './serial-arm-skeleton.ts';
import type { Vector3 } from './vector3.ts';

/** A rigid placement: the rotation's columns (x-, y- and z-axis of the moved frame) and the origin, all real. */
export interface Frame {
  readonly x: Vector3;
  readonly y: Vector3;
  readonly z: Vector3;
  readonly origin: Vector3;
}

const combine = (a: Vector3, b: Vector3, ca: number, cb: number): Vector3 => [ca * a[0] + cb * b[0], ca * a[1] + cb * b[1], ca * a[2] + cb * b[2]];

/**
 * Forward kinematics of a 6R arm in Denavit–Hartenberg form: the frames A₁⋯Aᵢ for i = 0 … 6 (seven frames, the base
 * first, the tool last) for joint angles given as (cos θᵢ, sin θᵢ) pairs, with Aᵢ = Rot_z(θᵢ)·Trans_z(dᵢ)·Trans_x(aᵢ)·Rot_x(αᵢ)
 * for i ≤ 5 and A₆ = Rot_z(θ₆)·Trans_z(d₆) (the tool frame sits on axis 6). Frame i − 1's z-axis is joint i's axis.
 * Real arithmetic; the angle pairs are used as given (not normalised).
 */
export function framesOf(arm: ArmData, angles: readonly (readonly [number, number])[]): Frame[] {
  const frames: Frame[] = [{ x: [1, 0, 0], y: [0, 1, 0], z: [0, 0, 1], origin: [0, 0, 0] }];
  for (let i = 0; i < 6; i++) {
    const f = frames[i]!;
    const [c, s] = angles[i]!;
    const x = combine(f.x, f.y, c, s), y = combine(f.x, f.y, -s, c);
    const origin = combine(f.origin, f.z, 1, arm.offset[i]!);
    if (i === 5) { frames.push({ x, y, z: f.z, origin }); break; }
    const [ca, sa] = [arm.cosTwist[i]!, arm.sinTwist[i]!];
    frames.push({ x, y: combine(y, f.z, ca, sa), z: combine(y, f.z, -sa, ca), origin: combine(origin, x, 1, arm.length[i]!) });
  }
  return frames;
}

/** The tool frame A₁⋯A₆ of framesOf (real). */
export function toolFrameOf(arm: ArmData, angles: readonly (readonly [number, number])[]): Frame {
  return framesOf(arm, angles)[6]!;
}
