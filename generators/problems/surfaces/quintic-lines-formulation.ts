import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import { homogeneousExponents, homogeneousNames } from '../shared/homogeneous-monomials.ts';
import { chartLineExpr } from '../shared/line-chart.ts';
import { randomFrame } from '../shared/random-frame.ts';
import { restrictForm } from '../shared/restrict-form.ts';

/** The 126 exponent vectors (x₀ … x₄) of a quintic form, x₀⁵ first. */
export const QUINTIC_EXPONENTS: readonly (readonly number[])[] = homogeneousExponents(5, 5);

/** The 126 coefficient names, c50000 … c00005 (the digits are the exponents of x₀ … x₄). */
export const QUINTIC_NAMES: readonly string[] = homogeneousNames('c', 5, 5);

/** The chart's unknowns: the line through frame·(1, 0, a, b, c) and frame·(0, 1, d, e, f). */
export const CHART_UNKNOWNS: readonly string[] = ['a', 'b', 'c', 'd', 'e', 'f'];

/** The seed the chart's change of coordinates is drawn from (recorded so that the formulation is reproducible). */
export const FRAME_SEED = 2875;

/** The real 5×5 change of coordinates of the chart (randomFrame(5, FRAME_SEED); rows give x₀ … x₄). */
export const QUINTIC_FRAME: readonly (readonly number[])[] = randomFrame(5, FRAME_SEED);

/**
 * Lines on a quintic threefold F = Σ c_e xᵉ = 0 in P⁴: restricting F to the chart line p + s·q gives a quintic in s
 * whose six coefficients (degree 5 in the six unknowns) must vanish; total-degree Bézout bound 5⁶ = 15625.
 */
export const quinticLinesFormulation: FormulationDefinition = {
  unknowns: CHART_UNKNOWNS,
  parameters: QUINTIC_NAMES,
  equations: (u, c, ops) => {
    const line = chartLineExpr(ops, QUINTIC_FRAME, CHART_UNKNOWNS.map((name) => u[name]!));
    const inS = restrictForm(ops, QUINTIC_NAMES.map((name) => c[name]!), QUINTIC_EXPONENTS, line);
    return inS.map((coefficient, k) => {
      if (!coefficient) throw new Error(`lines-on-a-quintic-threefold: the coefficient of s^${k} vanished identically`);
      return coefficient;
    });
  },
  description: [
    'A line of $\\mathbb{P}^4$ that misses the plane $y_0 = y_1 = 0$ is spanned by exactly one pair of points $(1, 0, a, b, c)$ and $(0, 1, d, e, f)$ in coordinates $y$, so six numbers chart the lines (an affine chart of the Grassmannian $G(2, 5)$).',
    `The coordinates $y$ are related to the quintic's coordinates by a fixed real change of coordinates $x = Gy$, drawn once from the recorded seed ${FRAME_SEED} (identity plus random normal entries of size $0.5$, rounded to two decimals), so that no line of a quintic we meet lies outside the chart.`,
    'Substituting $x = G\\,(p + s\\,q)$ into $F$ gives a quintic in $s$ whose six coefficients must vanish: six equations of degree $5$ in $(a, \\dots, f)$, Bézout bound $5^6 = 15625$.',
  ].join(' '),
};
