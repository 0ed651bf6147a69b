import definition from '../../../../generators/problems/schubert/lines-meeting-eight-3-planes-in-5-space.ts';
import { describeSchubertPage } from './schubert-cases.ts';

describeSchubertPage({
  definition,
  shape: { k: 2, n: 6 },
  // Fourteen lines meet eight general 3-planes in 5-space: Schubert, Acta Mathematica 8 (1886); deg G(2,6) = 14,
  // the Catalan number C_4 (Fulton, Young Tableaux, 1997).
  published: 14,
  totalDegree: 256, // 2^8, eight quadrics (our formulation)
  rowGroupBound: 70, // 8!/(4!·4!) (our formulation)
  seeds: [1, 2, 3, 4],
  totalDegreeSeeds: [1],
  demo: 'eight-screens',
  demoSeeds: [13, 1, 2],
});
