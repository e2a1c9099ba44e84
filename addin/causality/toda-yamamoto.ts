/**
 * Toda & Yamamoto's (1995) lead-lag test, valid whatever the series' orders of integration and
 * whether or not they are cointegrated.
 *
 * Fit a VAR in levels with p + dmax lags and a constant, where p is the lag order the data need
 * and dmax the highest order of integration of the two series. Test only the first p lags of
 * the cause in the effect's equation with a Wald chi-square(p); the dmax extra lags stay
 * unrestricted, which is what restores the usual chi-square limit on non-stationary data.
 * The coefficient covariance is the reference library's: sigma_e^2 (Z'Z)^{-1} with
 * sigma_e^2 = SSR_e / (n - K(p + dmax) - 1).
 */
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { MooringInputError } from '../errors';
import { chiSquareCriticalValues, chiSquareUpperP } from '../distributions';
import type { TestResult } from '../result';
import { coefficientWald } from '../var/coefficient-wald';
import { coefficientRow, fitVar } from '../var/fit-var';
import { checkedBlock, checkedLagCount } from '../var/var-design';
import { resolveLags, liftedWarning, type LagChoice } from './causality-lags';
import { DEFAULT_PAIR_NAMES, leadLagHypotheses, possessive, type PairNames } from './causality-wording';
import { extraLagsFromOrders, type ExtraLagsChoice } from './extra-lags';
import type { PairWork } from './pair-work';

/** Options of todaYamamoto. */
export interface TodaYamamotoOptions {
  /** p: lags tested (a number, or 'aic'/'bic' chosen on the VAR in levels; default 'aic'). */
  lags?: LagChoice;
  /** dmax: extra lags left untested. Default: the highest order of integration of the two series. */
  extraLags?: number;
  /** Ceiling of the lag search when lags is 'aic' or 'bic'. */
  maxLags?: number;
  /** Significance level of the unit-root tests that set dmax when extraLags is not given (default 0.05). */
  alpha?: number;
  /** How a given extraLags was found, for the record (default "given"). */
  extraLagsRule?: string;
  /** Work shared with the other direction of the pair (leadLag): the lag order, chosen once. */
  work?: PairWork;
}

/** Wald test that the cause's first p lags are zero in the effect's equation of a VAR(p + dmax) in levels. */
export function todaYamamoto(cause: ArrayLike<number>, effect: ArrayLike<number>, options: TodaYamamotoOptions = {}, names: PairNames = DEFAULT_PAIR_NAMES): TestResult {
  const given = checkedBlock([cause, effect], [names.cause, names.effect]);
  // The Wald statistic is free of units; the VAR's moments are not (they overflow for prices of
  // 1e300 and vanish for 1e-300): each series is brought to a size near one by a power of two,
  // and the coefficients reported below are converted back (effect's units per cause's unit).
  const factors = given.map((s) => powerOfTwoScale(s));
  const pair = given.map((s, i) => scaled(s, factors[i]));
  const T = pair[0].length;
  let extra: ExtraLagsChoice;
  if (options.extraLags === undefined) {
    extra = extraLagsFromOrders(pair, names, options.alpha ?? 0.05);
  } else {
    extra = { extraLags: checkedLagCount(options.extraLags, 'The extra lags (dmax)'), rule: options.extraLagsRule ?? 'given', orders: null, warnings: [] };
  }
  const dmax = extra.extraLags;
  // The pair's shared lag order applies when cause and effect are its two series, in either order.
  const at = options.work?.indexOf(cause) ?? -1;
  const shared = at >= 0 && options.work?.indexOf(effect) === 1 - at;
  const resolved = shared && options.work ? options.work.lagsOn('values') : resolveLags(pair, options.lags, options.maxLags);
  const p = resolved.lags;
  const fitted = p + dmax;
  const needed = fitted + 2 * fitted + 2;
  if (T < needed) {
    throw new MooringInputError(
      `A Toda-Yamamoto test with ${p} lags and ${dmax} extra fits a VAR with ${fitted} lags and needs at least ${needed} rows; the series have ${T}. Use fewer lags or a longer history.`,
    );
  }

  const fit = fitVar(pair, fitted, { names: [names.cause, names.effect] });
  const effectEquation = fit.equations[1];
  const rows = Array.from({ length: p }, (_, j) => coefficientRow(fit, 0, j + 1));
  const wald = coefficientWald(effectEquation, rows);
  const { nullHypothesis, alternative } = leadLagHypotheses(names, 'values');
  const warnings = [...extra.warnings, ...liftedWarning(resolved)];
  if (fit.nobs < 30) warnings.push(`Only ${fit.nobs} rows in the VAR: the chi-square approximation is rough this short.`);
  if (dmax === 0) warnings.push('With no extra lags this is a plain Wald test in a levels VAR: valid only if both series are stationary.');

  return {
    test: 'Toda-Yamamoto',
    title: `Lead-lag test (Toda-Yamamoto): does ${names.cause} lead ${names.effect}?`,
    statisticName: 'Wald chi-square',
    statistic: wald.statistic,
    pValue: chiSquareUpperP(wald.statistic, p),
    critical: chiSquareCriticalValues(p),
    rejectTail: 'upper',
    lags: p,
    lagRule: resolved.rule,
    nobs: fit.nobs,
    deterministic: 'const',
    nullHypothesis: `${nullHypothesis} (first ${p} of ${fitted} lags in a VAR in levels)`,
    alternative,
    warnings,
    details: [
      { key: 'df', label: 'Chi-square degrees of freedom (lags tested)', value: p },
      { key: 'extraLags', label: 'Extra lags left untested (dmax)', value: dmax },
      { key: 'extraLagsRule', label: 'How dmax was set', value: extra.rule },
      { key: 'lagsFitted', label: 'Lags in the VAR (p + dmax)', value: fitted },
      { key: 'orderCause', label: `Order of integration of ${names.cause}`, value: extra.orders?.cause ?? null },
      { key: 'orderEffect', label: `Order of integration of ${names.effect}`, value: extra.orders?.effect ?? null },
      ...wald.coefficients.map((b, j) => ({
        key: `causeLag${j + 1}`,
        label: `Coefficient on ${possessive(names.cause)} lag ${j + 1} in ${possessive(names.effect)} equation`,
        value: (b * factors[0]) / factors[1],
      })),
    ],
  };
}
