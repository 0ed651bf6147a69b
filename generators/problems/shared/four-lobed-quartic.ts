import { linearForm, product, sum, type NumericPolynomial } from './numeric-polynomial.ts';
import { ellipseForm } from './ellipse-form.ts';

/**
 * Our demo quartic E₁·E₂ − 0.1 for two crossing ellipses (semi-axes 2.2 × 1 turned 0.3 rad about (0.1, −0.1), and
 * 1.1 × 2 turned 0.25 rad about (−0.1, 0.05)): a four-lobed outer oval hugging their union, whose four shallow dents
 * carry two real flexes each, around a convex inner oval hugging their common part.
 */
export function fourLobedQuartic(): NumericPolynomial {
  return sum(product(ellipseForm(2.2, 1, 0.3, 0.1, -0.1), ellipseForm(1.1, 2, 0.25, -0.1, 0.05)), linearForm([0, 0], -0.1));
}
