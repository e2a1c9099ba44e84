/**
 * Order of integration d in {0, 1, 2} (or "above 2") by testing from the highest order down
 * (Pantula 1989): ADF on the second differences, then the first differences, then the levels,
 * stopping at the first unit root that is not rejected. KPSS confirms: at the chosen order the
 * differenced series should look stationary to KPSS, and one difference fewer should not.
 *
 * Deterministic terms: the levels take the requested terms (default a constant); differences of
 * a trending series have a constant, so differences use a constant unless "none" was asked.
 * Series with fewer than 20 usable observations are refused (common practice: cointegration work
 * needs at least about 20 observations).
 *
 * unitRootTest 'dfgls' lets DF-GLS (dfgls.ts, modified AIC lags) decide the levels step instead of
 * ADF: on the same draws it rejects a false unit root in slowly reverting levels far more often at
 * the same size (tests/unitroot/gls-size-and-power.test.ts), so fewer I(0) series are called I(1).
 * The difference steps keep ADF: differences of a stationary series carry a moving-average root
 * near one, where the modified AIC picks long lags and DF-GLS failed to reject in 57 of 100
 * differenced AR(0.95) series of 200 rows (calling them "above 2"), while ADF rejected in all.
 * DF-GLS rather than Ng-Perron because it gives a p-value at the sample's own size. ADF stays the
 * default: the report and its reference tests are built on it. DF-GLS always removes at least a
 * constant, so 'none' is refused with it.
 */
import { MooringInputError } from '../errors';
import { DETERMINISTIC_WORDS, type Deterministic, type TestResult } from '../result';
import { adfTest } from './adf';
import { dfglsTest } from './dfgls';
import { kpssTest } from './kpss';

export const MIN_OBSERVATIONS = 20;

export interface IntegrationOrderOptions {
  alpha?: number;
  deterministic?: Deterministic;
  /**
   * Where the downward testing starts (default 2: Pantula's order, second differences first).
   * 1 starts at the first differences and tests the second differences only when the first
   * still have a unit root (to tell 2 from "above 2"). For the usual I(0) and I(1) prices this
   * skips the costliest regression (second differences take the longest lag search); it can
   * differ from the default only if the second differences keep a unit root while the first do
   * not, which an over-differenced series does not do. Used by the lead-lag tests.
   */
  highestDifference?: 1 | 2;
  /** The unit-root test that decides the levels step: 'adf' (the default) or 'dfgls'; differences always take ADF. */
  unitRootTest?: 'adf' | 'dfgls';
}

export interface OrderStep {
  differences: number;
  /** The unit-root test that decides the step: ADF, or DF-GLS on the levels when asked (its `test` names it). */
  adf: TestResult;
  kpss: TestResult;
  adfRejects: boolean;
  kpssRejects: boolean;
}

export interface IntegrationOrderResult {
  name: string;
  order: 0 | 1 | 2 | 'above 2';
  /** True when KPSS tells the same story as ADF at the chosen order. */
  agree: boolean;
  deterministic: Deterministic;
  alpha: number;
  steps: OrderStep[];
  verdict: string;
  warnings: string[];
}

function difference(x: ArrayLike<number>, times: number): Float64Array {
  let out = Float64Array.from(x as ArrayLike<number>);
  for (let k = 0; k < times; k++) {
    const next = new Float64Array(out.length - 1);
    for (let i = 0; i < next.length; i++) next[i] = out[i + 1] - out[i];
    out = next;
  }
  return out;
}

const ORDER_WORDS: Record<string, string> = {
  '0': 'stationary in levels, I(0): it returns to its own mean',
  '1': 'integrated of order 1, I(1): its level wanders but its changes are stationary',
  '2': 'integrated of order 2, I(2): even its changes wander; only the changes of the changes are stationary',
  'above 2': 'integrated of an order above 2: differencing twice still leaves a unit root',
};

export function integrationOrder(series: ArrayLike<number>, options: IntegrationOrderOptions = {}, name = 'the series'): IntegrationOrderResult {
  const alpha = options.alpha ?? 0.05;
  const deterministic = options.deterministic ?? 'const';
  if (!DETERMINISTIC_WORDS.includes(deterministic)) {
    throw new MooringInputError(`Unknown deterministic terms '${String(deterministic)}': use one of ${DETERMINISTIC_WORDS.join(', ')}.`);
  }
  const decider = options.unitRootTest ?? 'adf';
  if (decider !== 'adf' && decider !== 'dfgls') throw new MooringInputError(`Unknown unit-root test '${String(decider)}': use adf or dfgls.`);
  if (decider === 'dfgls' && deterministic === 'none') {
    throw new MooringInputError('DF-GLS always removes at least a constant: use const or trend with it, or the ADF test for none.');
  }
  if (!(alpha > 0 && alpha < 0.5)) throw new MooringInputError(`The significance level must lie between 0 and 0.5; got ${alpha}.`);
  if (series.length - 2 < MIN_OBSERVATIONS) {
    throw new MooringInputError(
      `${name} has ${series.length} usable observations; deciding its order of integration needs at least ${MIN_OBSERVATIONS + 2} (common practice: about 20 after differencing twice).`,
    );
  }
  const stepAt = (d: number): OrderStep => {
    const x = difference(series, d);
    const det: Deterministic = d === 0 ? deterministic : deterministic === 'none' ? 'none' : 'const';
    const label = d === 0 ? name : d === 1 ? `changes in ${name}` : `second changes in ${name}`;
    const adf = decider === 'dfgls' && d === 0 ? dfglsTest(x, { deterministic: det === 'trend' ? 'trend' : 'const' }, label) : adfTest(x, { deterministic: det }, label);
    const kpss = kpssTest(x, { deterministic: det === 'trend' ? 'trend' : 'const' }, label);
    return { differences: d, adf, kpss, adfRejects: (adf.pValue ?? 1) < alpha, kpssRejects: (kpss.pValue ?? 0) < alpha };
  };

  const highest = options.highestDifference ?? 2;
  if (highest !== 1 && highest !== 2) throw new MooringInputError(`The most differences tested must be 1 or 2; got ${String(highest)}.`);
  const steps: OrderStep[] = [];
  let order: IntegrationOrderResult['order'] = 0;
  for (let d = highest; d >= 0; d--) {
    const step = stepAt(d);
    steps.push(step);
    if (!step.adfRejects) {
      order = d === 2 ? 'above 2' : ((d + 1) as 1 | 2);
      break;
    }
  }
  if (highest === 1 && order === 2) {
    const second = stepAt(2);
    steps.unshift(second);
    if (!second.adfRejects) order = 'above 2';
  }
  const numeric = order === 'above 2' ? 3 : order;
  const atOrder = steps.find((s) => s.differences === numeric);
  const below = steps.find((s) => s.differences === numeric - 1);
  const kpssAtOrderFine = atOrder ? !atOrder.kpssRejects : true;
  const kpssBelowRejects = below ? below.kpssRejects : true;
  const agree = kpssAtOrderFine && kpssBelowRejects;

  const testName = decider === 'dfgls' && numeric === 0 ? 'DF-GLS' : decider === 'dfgls' ? 'DF-GLS on the levels, ADF on the differences,' : 'ADF';
  const warnings: string[] = [];
  if (!agree) {
    warnings.push(
      `${testName} and KPSS disagree for ${name}: ${!kpssAtOrderFine ? `KPSS rejects stationarity after ${numeric} difference(s)` : `KPSS does not reject stationarity with ${numeric - 1} difference(s)`}. Treat the order as uncertain; a longer sample or other deterministic terms may settle it.`,
    );
  }
  if (series.length < 50) warnings.push(`Only ${series.length} observations: unit-root tests have little power this short.`);
  const verdict = `At the ${Math.round(alpha * 1000) / 10}% level, ${name} is ${ORDER_WORDS[String(order)]}${agree ? ` (${testName} and KPSS agree).` : ` (${testName} decides; KPSS disagrees).`}`;
  return { name, order, agree, deterministic, alpha, steps, verdict, warnings };
}
