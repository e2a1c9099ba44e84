/**
 * One direction of a lead-lag question, "does CAUSE lead EFFECT?", answered by the named test:
 * the F test on the values or on the changes (Granger 1969), Toda-Yamamoto (1995) or the
 * error-correction form (Granger 1988). Each returns TestResults that state their null in words;
 * the error-correction form returns two (short run and long run).
 *
 * With lags 'aic' or 'bic' the VAR order is chosen on the data each test models: the values for
 * the F test on values and Toda-Yamamoto, the changes for the F test on changes, and the values
 * less one lag (a VAR(P) in levels has P - 1 lagged changes) for the error-correction form.
 */
import { MooringInputError } from '../errors';
import { rejects, type TestResult } from '../result';
import { checkedBlock, differences } from '../var/var-design';
import type { LagChoice } from './causality-lags';
import { DEFAULT_PAIR_NAMES, type PairNames } from './causality-wording';
import type { CausalityMethod } from './choose-causality-test';
import { errorCorrectionCausality } from './error-correction-causality';
import { grangerF } from './granger-f';
import type { PairWork } from './pair-work';
import { todaYamamoto } from './toda-yamamoto';

/** The method words grangerTest accepts. */
export const CAUSALITY_METHODS: readonly CausalityMethod[] = ['f-levels', 'f-differences', 'toda-yamamoto', 'error-correction'];

/** Options of grangerTest; each applies to the methods its comment names. */
export interface GrangerTestOptions {
  /** Which test; default 'f-levels', Granger's test on the values as given. */
  method?: CausalityMethod;
  /** Lags: a number or 'aic'/'bic' (default 'aic'). */
  lags?: LagChoice;
  maxLags?: number;
  /** Toda-Yamamoto only: dmax (default from the integration orders). */
  extraLags?: number;
  /** Error-correction only: the equilibrium error (default: OLS of effect on a constant and cause). */
  equilibriumError?: ArrayLike<number>;
  /** Level of the unit-root tests that set dmax when extraLags is not given. */
  alpha?: number;
  /** Toda-Yamamoto only: how a given extraLags was found, for the record. */
  extraLagsRule?: string;
  /** Work shared by both directions of a pair (leadLag); used when cause and effect are its two series. */
  work?: PairWork;
}

/** One direction's answer: which test, its result and, for the error-correction form, the long-run result. */
export interface CausalityDirection {
  cause: string;
  effect: string;
  method: CausalityMethod;
  /** The headline test: the F or Wald test, or the short-run test of the error-correction form. */
  test: TestResult;
  /** The long-run test of the error-correction form; null for the other methods. */
  longRun: TestResult | null;
}

/** Runs the named lead-lag test for one direction. */
export function grangerTest(cause: ArrayLike<number>, effect: ArrayLike<number>, options: GrangerTestOptions = {}, names: PairNames = DEFAULT_PAIR_NAMES): CausalityDirection {
  const method = options.method ?? 'f-levels';
  const base = { cause: names.cause, effect: names.effect, method };
  const lagOptions = { lags: options.lags, maxLags: options.maxLags };
  // The pair's shared work, when cause and effect are its two series (in either order).
  const at = options.work?.indexOf(cause) ?? -1;
  const work = at >= 0 && options.work?.indexOf(effect) === 1 - at ? options.work : undefined;
  switch (method) {
    case 'f-levels':
      return { ...base, test: grangerF(cause, effect, { ...lagOptions, resolved: work?.lagsOn('values') }, names), longRun: null };
    case 'f-differences': {
      const [x, y] = checkedBlock([cause, effect], [names.cause, names.effect]);
      return { ...base, test: grangerF(differences(x), differences(y), { ...lagOptions, form: 'changes', resolved: work?.lagsOn('changes') }, names), longRun: null };
    }
    case 'toda-yamamoto':
      return {
        ...base,
        test: todaYamamoto(cause, effect, { ...lagOptions, extraLags: options.extraLags, alpha: options.alpha, extraLagsRule: options.extraLagsRule, work }, names),
        longRun: null,
      };
    case 'error-correction': {
      const ecm = errorCorrectionCausality(cause, effect, { ...lagOptions, equilibriumError: options.equilibriumError }, names);
      return { ...base, test: ecm.shortRun, longRun: ecm.longRun };
    }
    default:
      throw new MooringInputError(`Unknown lead-lag test '${String(method)}': use one of ${CAUSALITY_METHODS.join(', ')}.`);
  }
}

/**
 * True when the direction shows a lead at level alpha. The error-correction form has two tests
 * (short run, long run); a lead in either counts, each judged at alpha / 2 (Bonferroni) so the
 * chance of a false lead stays at most alpha.
 */
export function directionLeads(direction: CausalityDirection, alpha: number): boolean {
  if (direction.longRun === null) return rejects(direction.test, alpha) === true;
  return rejects(direction.test, alpha / 2) === true || rejects(direction.longRun, alpha / 2) === true;
}
