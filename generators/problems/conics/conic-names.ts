import { checkShape, type TangencyShape } from './tangency-layout.ts';

/** The six coefficient letters of a conic a·x² + b·xy + c·y² + d·x + e·y + f. */
export const CONIC_LETTERS = ['a', 'b', 'c', 'd', 'e', 'f'] as const;

/**
 * Parameter names of the rung "through p points, tangent to k conics", in the packed order both formulations use:
 * the points x1, y1, …, xp, yp, then the conics' coefficients a1 … f1, …, ak … fk.
 */
export function parameterNames(shape: TangencyShape): string[] {
  checkShape(shape);
  const names: string[] = [];
  for (let j = 1; j <= shape.points; j++) names.push(`x${j}`, `y${j}`);
  for (let i = 1; i <= shape.conics; i++) for (const l of CONIC_LETTERS) names.push(`${l}${i}`);
  return names;
}

/** Unknown names of the tangency-point formulation: the conic's coefficients, then s_i, r_i per given conic. */
export function tangencyUnknownNames(shape: TangencyShape): string[] {
  checkShape(shape);
  const names: string[] = [...CONIC_LETTERS];
  for (let i = 1; i <= shape.conics; i++) names.push(`s${i}`, `r${i}`);
  return names;
}
