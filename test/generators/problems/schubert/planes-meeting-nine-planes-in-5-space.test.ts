import definition from '../../../../generators/problems/schubert/planes-meeting-nine-planes-in-5-space.ts';
import { describeSchubertPage } from './schubert-cases.ts';

describeSchubertPage({
  definition,
  shape: { k: 3, n: 6 },
  // Forty-two planes meet nine general planes in 5-space: Schubert, Acta Mathematica 8 (1886); deg G(3,6) = 42,
  // the standard Young tableaux of the 3 × 3 square (Fulton, Young Tableaux, 1997).
  published: 42,
  totalDegree: 768, // 3·2^8: one cubic and eight quadrics once the shared det X term is subtracted (our formulation)
  rowGroupBound: 1680, // 9!/(3!·3!·3!) (our formulation)
  seeds: [1, 2],
  totalDegreeSeeds: [1],
  demo: 'nine-sheets',
  demoSeeds: [17, 1, 2],
});
