// How the drone-waypoints demo was chosen: node --experimental-strip-types
// generators/problems/rational-curves/quartic-demo-search.ts <first seed> <layouts>. Each layout is eleven points with
// coordinates on a 0.5 m grid in a 40 m × 24 m field, drawn from the seed; each is solved by the page's parameter
// homotopy and the number of real quartics (real maps) is printed. The layout with most real quartics became the demo.
import { createRandom, isRealPoint, solveByParameterHomotopy } from '../../../src/engine/index.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import quartics from './rational-quartics-through-11-points.ts';

const first = Number(process.argv[2] ?? 1), layouts = Number(process.argv[3] ?? 4);
const solver = quartics.solver;
if (solver?.kind !== 'parameter-homotopy') throw new Error('the quartic page must use the parameter homotopy');
const problem = await solver.prepare(systemOf(quartics));
for (let seed = first; seed < first + layouts; seed++) {
  const random = createRandom(seed);
  const points = Array.from({ length: 11 }, () => [Math.round(random.next() * 80 - 40) / 2, Math.round(random.next() * 48 - 24) / 2]);
  const target = Float64Array.from(points.flatMap(([x, y]) => [x!, 0, y!, 0]));
  const began = performance.now();
  const report = await solveByParameterHomotopy(problem, target, { seed: 23 });
  const real = report.solutions.filter((s) => isRealPoint(s.point)).length;
  console.log(JSON.stringify({ seed, found: report.solutions.length, failed: report.stats.failed, real, seconds: Math.round((performance.now() - began) / 1000), points }));
}
