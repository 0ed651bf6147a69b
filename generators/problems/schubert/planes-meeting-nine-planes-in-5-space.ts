import { schubertProblem } from './schubert-problem.ts';

export default schubertProblem({
  shape: { k: 3, n: 6 },
  slug: 'planes-meeting-nine-planes-in-5-space',
  title: 'Planes meeting nine planes in 5-space',
  tags: ['Schubert calculus', 'Grassmannian', 'planes', 'Young tableaux', 'Plücker coordinates', 'excess intersection'],
  question: 'Given nine general planes (2-dimensional affine subspaces) in 5-space, find every plane that meets all nine, each in at least a point. Over the complex numbers, counted in projective 5-space, there are exactly $42$. Planes in 5-space form a 9-dimensional family, and meeting a plane there is one condition (two planes in 5-space usually miss each other).',
  excessNote: [
    'Taken as they come, the nine determinants are cubics: Bézout bound $3^9 = 19683$ for $42$ planes.',
    'The reason so many paths would be wasted is plain in these coordinates: the only cubic term of each equation is $\\det X$ times a constant of its given plane, so all nine have the same top-degree part up to scale and vanish together at infinity on the whole cubic hypersurface $\\det X = 0$, a 7-dimensional set.',
    'Subtracting that shared part leaves one cubic and eight quadrics, Bézout bound $768$, still $726$ more than the true count.',
    'Their top-degree parts are $\\det X$ and combinations of the $2 \\times 2$ minors of $X$, which all vanish on the matrices of rank one, a 4-dimensional set of directions at infinity: the surplus paths diverge towards it rather than to isolated points.',
    'The rows-as-groups start that the generator uses ($1680$ paths, each equation linear in each row) sends its $1638$ surplus paths to where the three spanning points fail to span a plane, for example two rows at infinity that coincide.',
    'The chart misses only planes meeting the fixed plane $x_0 = x_1 = x_2 = 0$, a tenth condition, so for general data every solution is in view.',
    'The same number $42$ counts lines meeting ten 4-planes in 6-space, $G(2,7)$: two different rectangles, $3 \\times 3$ and $2 \\times 5$, with the same number of standard fillings.',
  ].join(' '),
  genericSeed: 20261207,
  demo: {
    id: 'nine-sheets',
    label: 'A sheet touching nine sheets',
    description: 'In a five-dimensional sculpture game of our own, a curved wire runs along $(t, t^2, t^3, t^4, t^5)$, and at nine stations, $t = -1.7, -1.2, -0.8, -0.4, 0.1, 0.5, 0.9, 1.3, 1.8$, a flat sheet (a plane) hugs the wire as closely as a plane can: through the wire point, along its velocity and acceleration. The player must place one more flat sheet that touches all nine. For sheets osculating this curve at real points every solution is real (the Shapiro conjecture, proved by Mukhin, Tarasov and Varchenko, Annals of Mathematics 2009).',
    seed: 17,
    stations: [-1.7, -1.2, -0.8, -0.4, 0.1, 0.5, 0.9, 1.3, 1.8],
  },
  drawn: 'Planes in 5-space are',
  reduceTopForm: true,
});
