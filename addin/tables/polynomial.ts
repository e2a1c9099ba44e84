/**
 * Value of a polynomial whose coefficients are listed in ascending powers:
 * c[0] + c[1]·x + c[2]·x² + …, evaluated by Horner's rule (nested multiplication,
 * which needs no powers and loses less precision).
 */
export function polynomialAscending(coefficients: readonly number[], x: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * x + coefficients[k];
  return value;
}
