import { schubertProblem } from './schubert-problem.ts';

export default schubertProblem({
  shape: { k: 2, n: 6 },
  slug: 'lines-meeting-eight-3-planes-in-5-space',
  title: 'Lines meeting eight 3-planes in 5-space',
  tags: ['Schubert calculus', 'Grassmannian', 'lines', 'Catalan numbers', 'Plücker coordinates', 'excess intersection'],
  question: 'Given eight general 3-dimensional affine subspaces (3-planes) of 5-space, find every line that meets all eight. Over the complex numbers, counted in projective 5-space, there are exactly $14$. Lines in 5-space form an 8-dimensional family, and meeting a 3-plane is one condition.',
  excessNote: [
    'The total-degree homotopy tracks $2^8 = 256$ paths for $14$ lines, so $242$ diverge, more than nine in ten.',
    'As for six planes in 4-space, the quadratic part of each equation combines the $2 \\times 2$ minors of the $2 \\times 4$ matrix $X$, and all eight vanish on the rank-one matrices: a 4-dimensional set of directions at infinity, where the surplus paths end.',
    'The rows-as-groups start tracks $70$ paths; its $56$ surplus ones end on the 3-dimensional set of $\\mathbb{P}^4 \\times \\mathbb{P}^4$ where both rows lie at infinity and coincide.',
    'The chart misses only lines meeting the fixed 3-plane $x_0 = x_1 = 0$, a ninth condition that general data leave unmet, so no solution hides off the chart.',
    'The gap between $70$ and $14$ is the price of the chart: in the Plücker embedding the lines form a variety of degree $14$ in $\\mathbb{P}^{14}$, and eight hyperplane sections meet it in exactly $14$ points.',
  ].join(' '),
  genericSeed: 20261206,
  demo: {
    id: 'eight-screens',
    label: 'A signal through eight screens',
    description: 'In a five-dimensional data-art installation of our own, a curved guide runs along $(t, t^2, t^3, t^4, t^5)$; at eight stations, $t = -1.6, -1.1, -0.6, -0.2, 0.3, 0.8, 1.2, 1.7$, a flat 3-dimensional screen hugs the guide as closely as possible (its osculating 3-plane). One straight signal must cross all eight screens. All fourteen such lines are real, as the Shapiro conjecture (Mukhin, Tarasov and Varchenko, Annals of Mathematics 2009) promises for osculating subspaces at real points.',
    seed: 13,
    stations: [-1.6, -1.1, -0.6, -0.2, 0.3, 0.8, 1.2, 1.7],
  },
  drawn: 'Lines in 5-space are',
});
