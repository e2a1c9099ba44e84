/**
 * leastSquaresEach (one factorisation of shared regressors, as the equations of a VAR use it)
 * against leastSquares run once per response. Data: our own seeded series (invented, for this
 * check only), prices near 5,000 and a response of another scale, so the power-of-two scaling
 * differs between the responses.
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom, randomWalk } from '../../addin/random';
import { leastSquares, leastSquaresEach } from '../../addin/regression/least-squares';

describe('leastSquaresEach', () => {
  it('gives each response exactly the fit leastSquares gives it alone (seed 4401)', () => {
    const rng = new SeededRandom(4401);
    const n = 500;
    const walk = randomWalk(rng, n + 2, { start: 5000, sigma: 2 });
    const columns = [new Float64Array(n).fill(1), walk.slice(1, n + 1), walk.slice(0, n)];
    const responses = [walk.slice(2), Float64Array.from(rng.normals(n), (v, i) => 1e-3 * v + 2e-7 * walk[i])];
    const each = leastSquaresEach(responses, columns, { names: ['constant', 'lag 1', 'lag 2'] });
    responses.forEach((y, e) => {
      const alone = leastSquares(y, columns, { names: ['constant', 'lag 1', 'lag 2'] });
      expect(Array.from(each[e].coefficients)).toEqual(Array.from(alone.coefficients));
      expect(each[e].ssr).toBe(alone.ssr);
      expect(each[e].covariance).toEqual(alone.covariance);
      expect(Array.from(each[e].residuals)).toEqual(Array.from(alone.residuals));
    });
  });
});
