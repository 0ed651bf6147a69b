import { linearForm, product, sum, type NumericPolynomial } from '../shared/numeric-polynomial.ts';
import { ellipseForm } from '../shared/ellipse-form.ts';

/**
 * Our demo quartic E₁·E₂ + 0.1 for the two crossing ellipses of the four-lobed quartic (2.2 × 1 turned 0.3 rad about
 * (0.1, −0.1), and 1.1 × 2 turned 0.25 rad about (−0.1, 0.05)): E₁·E₂ < 0 exactly inside one ellipse but not the other,
 * so its real points are four ovals, one in each of those four petals. Exact up to binary64 rounding.
 */
export function fourIslandsQuartic(): NumericPolynomial {
  return sum(product(ellipseForm(2.2, 1, 0.3, 0.1, -0.1), ellipseForm(1.1, 2, 0.25, -0.1, 0.05)), linearForm([0, 0], 0.1));
}
