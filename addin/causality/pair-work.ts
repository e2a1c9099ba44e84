/**
 * Work that both directions of a lead-lag question share, done once per pair (leadLag runs
 * a -> b and b -> a on the same data): the VAR lag order. AIC, BIC and ln|Sigma| do not depend on the order of the series in the VAR
 * (a permutation leaves the determinant as it is), so the order chosen for [a, b] serves [b, a]
 * too; it is chosen once on the values and once on the changes, as each test needs. At a million
 * rows the lag search was the costliest step of the lead-lag test, made once per direction.
 *
 * The Toda-Yamamoto VAR is not shared: a fit of [b, a] orders its columns differently, and on
 * long price series (levels' lags nearly collinear) the Wald statistic then moves by a few 1e-10
 * of itself; each direction keeps the column order it always had.
 */
import { differences } from '../var/var-design';
import { resolveLags, type LagChoice, type ResolvedLags } from './causality-lags';

/** Which data a lag order is chosen on: the values, or their first differences. */
export type LagData = 'values' | 'changes';

/** A pair's shared work; `pair` holds [a, b] as checked by the caller. */
export class PairWork {
  private readonly lagsByData = new Map<LagData, ResolvedLags>();

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
}
