/**
 * The Johansen rank test as the diagnostic runs it, with its two choices made from the data
 * and each explained in one sentence:
 *
 * - The deterministic case. Prices that drift (a mean change significantly away from zero)
 *   put linear trends in the data, which the 'constant' case allows for; prices that do not
 *   drift are better served by 'restricted-constant', the constant inside the relation, since
 *   the 'constant' case over-rejects on driftless data (johansen-warnings.ts). The drift check
 *   is the Johansen module's own simple t-test of the mean change (driftingSeries).
 * - The lags. The VAR order p of the levels by the report's criterion (chooseVarLags, AIC or
 *   BIC); the error-correction form then keeps K = p - 1 lagged changes (Johansen 1995,
 *   ch. 4: a VAR(p) in levels is an error-correction model with p - 1 lagged differences).
 */
import { MooringInputError, isMooringInputError } from '../errors';
import { johansenTest, type JohansenCase } from '../johansen/johansen';
import { JOHANSEN_CASE_LABEL } from '../johansen/deterministic-case';
import { driftingSeries, listNames } from '../johansen/johansen-warnings';
import { chooseVarLags, type VarLagChoice } from '../var/choose-var-lags';
import type { JohansenSummary } from './report-types';
import { summariseTest } from './test-summary';

/** The case to use and why, in one sentence. */
export function chooseJohansenCase(block: readonly Float64Array[], names: readonly string[], asked: JohansenCase | 'auto'): { case: JohansenCase; reason: string } {
  if (asked !== 'auto') return { case: asked, reason: `The '${asked}' case (${JOHANSEN_CASE_LABEL[asked]}) was asked for.` };
  const drifts = driftingSeries(block);
  const drifting = names.filter((_, i) => drifts[i]);
  if (drifting.length > 0) {
    const verb = drifting.length === 1 ? 'drifts' : 'drift';
    return {
      case: 'constant',
      reason: `'constant' case: ${listNames(drifting)} ${verb} (the mean change is significant at 5%), so the data may trend and the constant is left free.`,
    };
  }
  return {
    case: 'restricted-constant',
    reason: `'restricted-constant' case: no series drifts (every mean change is insignificant at 5%), so the constant belongs inside the long-run relation.`,
  };
}

/** K lagged changes from the VAR order of the levels (or the one already chosen), and why. */
export function chooseJohansenLags(block: readonly Float64Array[], lagRule: 'aic' | 'bic', known?: VarLagChoice, names?: readonly string[]): { lags: number; reason: string } {
  const choice = known ?? chooseVarLags(block, { names });
  const p = choice[lagRule];
  const lags = Math.max(p - 1, 0);
  const rule = lagRule.toUpperCase();
  return {
    lags,
    reason: p === 0
      ? `${rule} preferred no lags in the VAR of the levels (up to ${choice.maxLags} tried); the test uses no lagged changes.`
      : `${rule} chose a VAR of order ${p} in the levels (up to ${choice.maxLags} tried), so the error-correction form keeps ${lags} lagged change${lags === 1 ? '' : 's'}.`,
  };
}

/** The Johansen test of the block with both choices made and explained, summarised; `varOrder` reuses a VAR order already chosen for the block. */
export function johansenSection(
  block: readonly Float64Array[],
  names: readonly string[],
  options: { alpha: number; lagRule: 'aic' | 'bic'; johansenCase: JohansenCase | 'auto'; varOrder?: VarLagChoice },
): JohansenSummary {
  const chosenCase = chooseJohansenCase(block, names, options.johansenCase);
  const chosenLags = chooseJohansenLags(block, options.lagRule, options.varOrder, names);
  let result;
  try {
    result = johansenTest(block.slice(), { case: chosenCase.case, lags: chosenLags.lags, alpha: options.alpha }, names.slice());
  } catch (e) {
    if (isMooringInputError(e)) throw new MooringInputError(`Johansen test of ${listNames(names)}: ${e.message}`, e.where);
    throw e;
  }
  return {
    series: names.slice(),
    case: result.case,
    caseReason: chosenCase.reason,
    lags: result.lags,
    lagsReason: chosenLags.reason,
    observations: result.nobs,
    eigenvalues: result.eigenvalues.slice(),
    trace: result.trace.map((t) => summariseTest(t, options.alpha)),
    maxEigen: result.maxEigen.map((t) => summariseTest(t, options.alpha)),
    rank: { ...result.rank },
    verdict: result.verdict,
    warnings: result.warnings.slice(),
  };
}
