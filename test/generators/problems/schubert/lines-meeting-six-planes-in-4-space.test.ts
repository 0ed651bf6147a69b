import definition from '../../../../generators/problems/schubert/lines-meeting-six-planes-in-4-space.ts';
import { describeSchubertPage } from './schubert-cases.ts';

describeSchubertPage({
  definition,
  shape: { k: 2, n: 5 },
  // Five lines meet six general planes in 4-space: Schubert, Anzahl-Bestimmungen für lineare Räume beliebiger
  // Dimension, Acta Mathematica 8 (1886); deg G(2,5) = 5 (Fulton, Young Tableaux, 1997).
  published: 5,
  totalDegree: 64, // 2^6, six quadrics (our formulation)
  rowGroupBound: 20, // 6!/(3!·3!), each equation bilinear in the rows (our formulation)
  seeds: [1, 2, 3, 4, 5, 6, 7, 8],
  totalDegreeSeeds: [1, 2, 3],
  demo: 'six-panels',
  demoSeeds: [11, 1, 2],
});
