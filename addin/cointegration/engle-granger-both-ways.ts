/**
 * Engle-Granger on a pair in both normalisations: a on b, and b on a. The two residuals are
 * different series, so in finite samples the two tests can disagree; when they do, the
 * evidence is borderline and the verdict says so rather than picking the convenient side.
 */
import { MooringInputError } from '../errors';
import { rejects } from '../result';
import { engleGranger, type EngleGrangerOptions, type EngleGrangerResult } from './engle-granger';
import { formatPValue, levelText } from './wording';

export interface BothWaysOptions extends EngleGrangerOptions {
  /** Significance level of the verdict (default 0.05). */
  alpha?: number;
}

export interface EngleGrangerBothWays {
  /** a regressed on b. */
  aOnB: EngleGrangerResult;
  /** b regressed on a. */
  bOnA: EngleGrangerResult;
  alpha: number;
  /** True when both normalisations reach the same decision at alpha. */
  agree: boolean;
  verdict: string;
}

export function engleGrangerBothWays(
  a: ArrayLike<number>,
  b: ArrayLike<number>,
  options: BothWaysOptions = {},
  names: { a?: string; b?: string } = {},
): EngleGrangerBothWays {
  const alpha = options.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 0.5)) throw new MooringInputError(`The significance level must lie between 0 and 0.5; got ${alpha}.`);
  const nameA = names.a ?? 'a';
  const nameB = names.b ?? 'b';
  const testOptions: EngleGrangerOptions = { deterministic: options.deterministic, lags: options.lags, maxLags: options.maxLags };
  const aOnB = engleGranger(a, [b], testOptions, { y: nameA, xs: [nameB] });
  const bOnA = engleGranger(b, [a], testOptions, { y: nameB, xs: [nameA] });
  const rejectA = rejects(aOnB.test, alpha);
  const rejectB = rejects(bOnA.test, alpha);
  const agree = rejectA === rejectB;
  const level = levelText(alpha);
  const pa = `${formatPValue(aOnB.test.pValue)} for ${nameA} on ${nameB}`;
  const pb = `${formatPValue(bOnA.test.pValue)} for ${nameB} on ${nameA}`;
  let verdict: string;
  if (rejectA && rejectB) {
    verdict = `${nameA} and ${nameB} are cointegrated at the ${level} level whichever side is regressed on the other (${pa}, ${pb}).`;
  } else if (rejectA === false && rejectB === false) {
    verdict = `No evidence at the ${level} level that ${nameA} and ${nameB} are cointegrated, either way round (${pa}, ${pb}).`;
  } else {
    const [yes, no] = rejectA ? [pa, pb] : [pb, pa];
    verdict = `The two directions disagree at the ${level} level: no cointegration is rejected with ${yes} but not with ${no}; treat the evidence as borderline.`;
  }
  return { aOnB, bOnA, alpha, agree, verdict };
}
