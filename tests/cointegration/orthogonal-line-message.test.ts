/**
 * The orthogonal (total least squares) line refuses a pair whose x barely moves: the line is
 * then vertical, and the message must name the series that barely moves (x), not the other.
 * Expected wording: our own message; the geometry is that of the smallest principal axis.
 */
import { describe, expect, it } from 'vitest';
import { totalLeastSquaresHedgeRatio } from '../../addin/cointegration/hedge-ratio';
import { SeededRandom } from '../../addin/random';

describe('the orthogonal line of a pair whose x barely moves', () => {
  it('names x as the series that hardly moves', () => {
    const r = new SeededRandom(11);
    const y = Float64Array.from({ length: 200 }, () => 100 + 10 * r.normal());
    const x = Float64Array.from({ length: 200 }, () => 50 + 1e-14 * r.normal());
    expect(() => totalLeastSquaresHedgeRatio(y, x)).toThrow(/^x hardly moves compared with y/);
  });
});
