import { schubertProblem } from './schubert-problem.ts';

export default schubertProblem({
  shape: { k: 2, n: 5 },
  slug: 'lines-meeting-six-planes-in-4-space',
  title: 'Lines meeting six planes in 4-space',
  tags: ['Schubert calculus', 'Grassmannian', 'lines', 'Catalan numbers', 'Plücker coordinates', 'excess intersection'],
  question: 'Given six general planes (2-dimensional affine subspaces) in 4-space, find every line that meets all six. Over the complex numbers, counted in projective 4-space, there are exactly $5$. Lines in 4-space form a 6-dimensional family, and meeting a plane is one condition, so six planes leave finitely many lines.',
  excessNote: [
    'The total-degree homotopy tracks $2^6 = 64$ paths and $59$ of them diverge.',
    'At infinity of the chart, where $X$ grows without bound, only the quadratic part of each equation matters: a combination of the three $2 \\times 2$ minors of $X$.',
    'All six quadratic parts vanish wherever the two rows of $X$ are parallel, a 3-dimensional set of directions at infinity (rank-one matrices); the $59$ surplus paths end on it, not at isolated points.',
    'With the rows as variable groups the start has $20$ paths, and the $15$ surplus ones go to the surface in $\\mathbb{P}^3 \\times \\mathbb{P}^3$ where both rows lie at infinity and coincide: the two spanning points become one point, their "line" is undefined, and every meeting determinant vanishes there.',
    'No true solution is lost off the chart: the lines it misses are those meeting the fixed plane $x_0 = x_1 = 0$, a seventh condition that no line meets together with six general planes.',
  ].join(' '),
  genericSeed: 20261205,
  demo: {
    id: 'six-panels',
    label: 'A beam touching six panels',
    description: 'In a four-dimensional maze game of our own, a curved rail runs through the game world along $(t, t^2, t^3, t^4)$. At six stations, $t = -1.6, -1, -0.4, 0.3, 0.9, 1.5$, a flat panel hugs the rail as closely as a plane can (its osculating plane: through the rail point, along the rail’s velocity and acceleration). The player must fire one straight beam that touches all six panels. All five beams are real: for subspaces osculating this curve at real points every solution is real (the Shapiro conjecture, proved by Mukhin, Tarasov and Varchenko, Annals of Mathematics 2009).',
    seed: 11,
    stations: [-1.6, -1, -0.4, 0.3, 0.9, 1.5],
  },
  drawn: 'Lines in 4-space are',
});
