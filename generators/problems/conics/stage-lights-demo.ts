import { ellipseCoefficients, type ConicCoefficients } from './conic-geometry.ts';
import type { ConicDemo } from './conic-tangency-problem.ts';

/**
 * Our own scenario for the conic ladder: five elliptical pools of light on a stage floor (metres; centre, semi-axes,
 * turn in radians) and four chalk marks. Invented numbers, chosen only to be in general position.
 */
const POOLS: readonly ConicCoefficients[] = [
  ellipseCoefficients(0, 0, 3, 1.2, 0.3),
  ellipseCoefficients(5, 1, 1.5, 0.8, 1.1),
  ellipseCoefficients(2, 5, 2.2, 0.9, -0.5),
  ellipseCoefficients(-3, 4, 1, 2, 0.2),
  ellipseCoefficients(-2, -3.5, 1.8, 0.7, 2),
];
const MARKS: readonly (readonly [number, number])[] = [[1.5, 2.2], [-1.2, 1.4], [3.6, -2.1], [0.4, -1.7]];

/** The stage demo with p chalk marks and the first 5 − p pools of light. */
export function stageLightsDemo(points: number): ConicDemo {
  const k = 5 - points;
  const marks = points === 0 ? '' : ` pass over ${points === 1 ? 'one chalk mark' : `${points} chalk marks`} on the floor and`;
  return {
    id: 'stage-lights',
    label: k === 5 ? 'Five pools of light on a stage' : `Pools of light and chalk marks on a stage`,
    description: `A choreographer wants a dancer's oval path to${marks} just graze the rim of ${k === 1 ? 'one elliptical pool' : `${k} elliptical pools`} of spotlight on the stage floor (units: metres). Each real conic that does so is a candidate path; its points of contact are drawn.`,
    points: MARKS.slice(0, points),
    conics: POOLS.slice(0, k),
  };
}
