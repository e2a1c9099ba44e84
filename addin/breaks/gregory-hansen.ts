/**
 * Gregory & Hansen (1996) test for cointegration with one regime shift at an unknown date.
 * Null: no cointegration. Alternative: y and the xs are cointegrated, with the relation's
 * level (model C), level and trend (C/T), or level and slopes (C/S) shifting once.
 *
 * For every candidate start s of the new regime, the regression of gregory-hansen-design.ts
 * is fitted and an ADF test run on its residual with no deterministic terms (the residual
 * already has mean zero); how its lags are set is in gregory-hansen-search.ts (by default a
 * rule applied once, to the residual without the shift, then used at every date).
 * The statistic ADF* is the smallest ADF t over the dates (the paper's ADF* = inf over tau
 * of ADF(tau)), and the date at the minimum is the estimated shift.
 *
 * Candidate dates: s = h .. T - h with h = floor(trim T), so each regime holds at least h
 * observations (the paper's tau in [0.15, 0.85] at trim 0.15).
 * Critical values: Gregory & Hansen (1996), Table 1 (addin/tables/gregory-hansen-table.ts;
 * most points compared with a typed copy of the printed table, the rest from memory, and
 * each result says which). No p-value: none was published.
 */
import { MooringInputError } from '../errors';
import { type ResultDetail, rejects } from '../result';
import { leastSquares } from '../regression/least-squares';
import { GREGORY_HANSEN_MODELS, gregoryHansenCritical, type GregoryHansenModel } from '../tables/gregory-hansen-table';
import { adfCore, type LagOption } from '../unitroot/adf-core';
import { LAG_RULES } from '../unitroot/adf-lag-search';
import { resolveMaxLag } from '../unitroot/max-lag';
import { DEFAULT_TRIM, breakLocation, edgeOfSearchWarning, requireFiniteSeries, requireTrim, trimmedCount, type RowLabel } from './break-location';
import { BREAKS_AGAIN_CAUTION } from './break-wording';
import { gregoryHansenColumnNames, gregoryHansenColumns, shiftedRelation, type ShiftedRelation } from './gregory-hansen-design';
import { criticalValueSourceText, gregoryHansenVerdict, lagMethodText, listWords, PAPER_MODEL, relationDetails, SHIFT_WORDS } from './gregory-hansen-wording';
import { LAG_TIMINGS, planShiftLags, searchShiftDates, type LagTiming } from './gregory-hansen-search';
import type { BreakTestResult } from './zivot-andrews';

export interface GregoryHansenOptions {
  /** What shifts: 'level' (model C), 'level-trend' (C/T) or 'regime' (C/S, level and slopes). */
  model: GregoryHansenModel;
  /** Share of the sample at each end where no shift is sought; default 0.15. */
  trim?: number;
  /** Lagged changes in each residual ADF: a whole number, or the rule that chooses it (default 'aic'). */
  lags?: LagOption;
  /** When a rule is applied: 'once' (default), to the residual without the shift, or at 'each-date' (the paper's way; rejects too often in our simulation). */
  lagTiming?: LagTiming;
  /** Largest lag a rule searches (default 12 (T/100)^(1/4) rounded up, capped at T/2 - 1). */
  maxLags?: number;
  /** Label of an observation by its index (e.g. its date); default "row <index + 1>". */
  rowLabel?: RowLabel;
}

/** Names of the dependent series and of each regressor, for sentences. */
export interface GregoryHansenNames {
  y?: string;
  xs?: string[];
}

/** The Gregory-Hansen result: the one result shape with the break, the verdict and the relation either side. */
export interface GregoryHansenResult extends BreakTestResult {
  relation: ShiftedRelation;
}

/** Refuses the call unless xs is a non-empty list of series as long as y, all finite. */
function requireInputs(y: unknown, xs: unknown, yName: string, xNames: string[]): { y: ArrayLike<number>; xs: ArrayLike<number>[] } {
  const yy = requireFiniteSeries(y, yName);
  if (!Array.isArray(xs) || xs.length === 0) {
    throw new MooringInputError('The Gregory-Hansen test needs at least one regressor series beside the dependent one.');
  }
  const checked = xs.map((x, j) => requireFiniteSeries(x, xNames[j]));
  checked.forEach((x, j) => {
    if (x.length !== yy.length) {
      throw new MooringInputError(
        `'${xNames[j]}' has ${x.length} values but '${yName}' has ${yy.length}: the series must cover the same rows (align them first).`,
        `series '${xNames[j]}'`,
      );
    }
  });
  return { y: yy, xs: checked };
}

function centred(s: ArrayLike<number>): { values: Float64Array; mean: number } {
  let mean = 0;
  for (let i = 0; i < s.length; i++) mean += s[i];
  mean /= s.length;
  const values = new Float64Array(s.length);
  for (let i = 0; i < s.length; i++) values[i] = s[i] - mean;
  return { values, mean };
}

/** Gregory-Hansen ADF* test of no cointegration against cointegration with one shift (see the file comment). */
export function gregoryHansenTest(
  y: ArrayLike<number>,
  xs: ArrayLike<number>[],
  options: GregoryHansenOptions,
  names: GregoryHansenNames = {},
): GregoryHansenResult {
  const model = options?.model;
  if (!GREGORY_HANSEN_MODELS.includes(model)) {
    throw new MooringInputError(`Unknown shift model '${String(model)}': use one of ${GREGORY_HANSEN_MODELS.join(', ')}.`);
  }
  const count = Array.isArray(xs) ? xs.length : 0;
  const yName = names.y ?? 'y';
  const xNames = Array.from({ length: count }, (_, j) => names.xs?.[j] ?? (count === 1 ? 'x' : `x${j + 1}`));
  const input = requireInputs(y, xs, yName, xNames);
  const trim = requireTrim(options.trim ?? DEFAULT_TRIM);
  const T = input.y.length;
  const m = input.xs.length;
  const h = trimmedCount(T, trim);
  const perRegime = model === 'regime' ? m + 1 : 1;
  if (h < perRegime + 1 || T < 20) {
    throw new MooringInputError(
      `${T} observations with trim ${trim} leave ${h} observations in the shorter regime, too few to fit ${model === 'regime' ? `${perRegime} coefficients in each regime` : 'a shift'}: ` +
        'use a longer series (at least 20 observations) or a larger trim.',
    );
  }
  const lags = options.lags ?? 'aic';
  let maxLags: number;
  if (typeof lags === 'number') maxLags = resolveMaxLag(T, 'none', lags, 'number of lags');
  else if (!LAG_RULES.includes(lags)) {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${LAG_RULES.join(', ')}.`);
  } else maxLags = resolveMaxLag(T, 'none', options.maxLags);

  const timing = options.lagTiming ?? 'once';
  if (!LAG_TIMINGS.includes(timing)) {
    throw new MooringInputError(`Unknown lag timing '${String(timing)}': use one of ${LAG_TIMINGS.join(', ')}.`);
  }

  const yc = centred(input.y);
  const xc = input.xs.map(centred);
  const xValues = xc.map((c) => c.values);
  const columnNames = gregoryHansenColumnNames(xNames, model);
  const plan = planShiftLags(yc.values, xValues, model, lags, maxLags, timing);
  const search = searchShiftDates(yc.values, xValues, model, h, plan, columnNames);
  if (search === null) {
    throw new MooringInputError(`${yName} is an exact combination of ${listWords(xNames)} at every candidate date: there is no equilibrium error to test.`);
  }
  // Refit the chosen date by QR and test its residual with the shared ADF code, for reporting.
  const fit = leastSquares(yc.values, gregoryHansenColumns(xValues, model, search.s), { names: columnNames });
  const core = adfCore(fit.residuals, plan.everyDate === null ? { deterministic: 'none', lags, maxLags: options.maxLags } : { deterministic: 'none', lags: plan.everyDate });
  const tau = core.regression.tau;

  const location = breakLocation(search.s - 1, T, options.rowLabel);
  const relation = shiftedRelation(fit.coefficients, model, yc.mean, xc.map((c) => c.mean));
  const table = gregoryHansenCritical(model, m);
  const critical: Record<string, number> = table ? { ...table } : {};
  const warnings: string[] = [];
  if (!table) warnings.push(`Gregory & Hansen (1996) published critical values for 1 to 4 regressors only; with ${m} there is no table and no decision.`);
  else warnings.push(criticalValueSourceText(model, m) as string);
  const lagsUsed = core.regression.lags;
  if (plan.rule !== 'fixed' && lagsUsed === plan.maxLags && plan.maxLags > 0) {
    warnings.push(`The lag rule took the largest lag searched (${plan.maxLags}); a larger maximum may fit better.`);
  }
  if (plan.everyDate === null) {
    warnings.push('Lags were chosen afresh at each date: in simulation this rejects no-cointegration more often than the stated level (about 8-14% at the 5% level for one regressor and T = 150-400); prefer lag timing \'once\' for decisions.');
  }
  if (T < 100) warnings.push(`Only ${T} observations: tests for cointegration with a shift have little power in short samples.`);
  const edge = edgeOfSearchWarning(location, h - 1, T - h - 1);
  if (edge) warnings.push(edge);
  warnings.push(BREAKS_AGAIN_CAUTION);

  const partial = {
    test: 'Gregory-Hansen',
    title: `Cointegration test with one shift (Gregory-Hansen) of ${yName} on ${listWords(xNames)}`,
    statisticName: 'ADF*',
    statistic: tau,
    pValue: null,
    pValueNote: 'not available: only critical values are published',
    critical,
    rejectTail: 'lower' as const,
    lags: lagsUsed,
    lagRule: plan.rule,
    nobs: core.regression.nobs,
    deterministic: model === 'level-trend' ? ('trend' as const) : ('const' as const),
    nullHypothesis: `${listWords([yName, ...xNames])} are not cointegrated: the equilibrium error has a unit root even allowing one shift`,
    alternative: `${listWords([yName, ...xNames])} are cointegrated, with one ${SHIFT_WORDS[model]} at an unknown date`,
    warnings,
  };
  const decision = rejects({ ...partial, details: [] }, 0.05);
  const verdict = gregoryHansenVerdict({ decision, statistic: tau, critical5: table?.['5%'] ?? null, model, yName, xNames, location, relation, m });
  const details: ResultDetail[] = [
    { key: 'verdict', label: 'Verdict at 5%', value: verdict },
    { key: 'model', label: 'What may shift (Gregory & Hansen model)', value: `${model} (${PAPER_MODEL[model]})` },
    { key: 'breakLabel', label: 'First observation of the new regime', value: location.label },
    { key: 'breakLastBeforeLabel', label: 'Last observation before the shift', value: location.lastBeforeLabel },
    { key: 'breakFraction', label: 'Share of the sample before the shift', value: location.fraction },
    { key: 'trim', label: 'Share trimmed at each end', value: trim },
    { key: 'candidates', label: 'Candidate dates searched', value: T - 2 * h + 1 },
    { key: 'maxLags', label: 'Largest lag searched', value: plan.rule === 'fixed' ? null : plan.maxLags },
    {
      key: 'lagMethod',
      label: 'How lags were set',
      value: lagMethodText(plan.rule, plan.everyDate === null),
    },
    ...relationDetails(relation, xNames),
  ];
  return { ...partial, details, breakAt: location, verdict, relation };
}
