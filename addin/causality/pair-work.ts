/**
 * Work that both directions of a lead-lag question share, done once per pair (leadLag runs
 * a -> b and b -> a on the same data):
 * - the VAR lag order: AIC, BIC and ln|Sigma| do not depend on the order of the series in the
 *   VAR (a permutation leaves the determinant as it is), so the order chosen for [a, b] serves
 *   [b, a] too; chosen once on the values and once on the changes, as each test needs;
 * - the VAR in levels that Toda-Yamamoto fits: one fit of [a, b] holds both equations, the
 *   effect's equation of each direction (equation-by-equation least squares, so each
 *   equation's fit is the one a fit of [b, a] would make, up to the column order).
 * At a million rows the lag search is the costliest step of the lead-lag test, and the VAR fit
 * the next; each is now made once rather than once per direction.
 */
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { fitVar, type VarFit } from '../var/fit-var';
import { differences } from '../var/var-design';
import { resolveLags, type LagChoice, type ResolvedLags } from './causality-lags';

/** Which data a lag order is chosen on: the values, or their first differences. */
export type LagData = 'values' | 'changes';

/** A pair's shared work; `pair` holds [a, b] as checked by the caller. */
export class PairWork {
  private readonly lagsByData = new Map<LagData, ResolvedLags>();
  private readonly varsByLags = new Map<number, { fit: VarFit; factors: number[] }>();

  constructor(
    readonly pair: readonly [Float64Array, Float64Array],
    private readonly lags: LagChoice | undefined,
    private readonly maxLags: number | undefined,
  ) {}

  /** Index (0 or 1) of a series of the pair, by identity; -1 when it is not one of them. */
  indexOf(series: ArrayLike<number>): number {
    return series === this.pair[0] ? 0 : series === this.pair[1] ? 1 : -1;
  }

  /** The lag count both directions use on the given data (resolveLags, once). */
  lagsOn(data: LagData): ResolvedLags {
    let found = this.lagsByData.get(data);
    if (found === undefined) {
      const block = data === 'values' ? [this.pair[0], this.pair[1]] : [differences(this.pair[0]), differences(this.pair[1])];
      found = resolveLags(block, this.lags, this.maxLags);
      this.lagsByData.set(data, found);
    }
    return found;
  }

  /**
   * The VAR(lags) in levels of [a, b], each series brought near one by a power of two (the
   * factors, exact), fitted once; `names` label it on the first call.
   */
  levelsVar(lags: number, names: readonly [string, string]): { fit: VarFit; factors: number[] } {
    let found = this.varsByLags.get(lags);
    if (found === undefined) {
      const factors = this.pair.map((s) => powerOfTwoScale(s));
      const unit = this.pair.map((s, i) => scaled(s, factors[i]));
      found = { fit: fitVar(unit, lags, { names }), factors };
      this.varsByLags.set(lags, found);
    }
    return found;
  }
}
