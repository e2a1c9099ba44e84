/**
 * The parts of a residual-based cointegration result shared by Engle-Granger and
 * Phillips-Ouliaris: the step-1 coefficients as details, the plain-words verdict, and what
 * to say when y is an exact combination of the xs.
 */
import { type ResultDetail, type TestResult, rejects } from '../result';
import { type CointegratingRegression, relationText } from './cointegrating-regression';
import { formatCoefficient, formatPValue, levelText, listText } from './wording';

/** The sentence given when y is an exact combination of the xs. */
export function exactFitVerdict(step1: CointegratingRegression): string {
  return (
    `${listText([step1.names.y, ...step1.names.xs])} move as one up to scale: the residual is zero ` +
    `(R² = ${step1.rSquared.toFixed(7)}), so they are cointegrated exactly and there is nothing left to test.`
  );
}

/** The warning given when y is an exact combination of the xs. */
export function exactFitWarning(step1: CointegratingRegression): string {
  return (
    `${step1.names.y} is an exact combination of ${listText(step1.names.xs)} (R² at or above 1 - 100·sqrt(machine epsilon)): ` +
    'the statistic is reported as minus infinity and the p-value as 0. Check that one column is not a copy or a formula of another.'
  );
}

/** Step-1 coefficients, fit and relation as labelled details. */
export function coefficientDetails(step1: CointegratingRegression): ResultDetail[] {
  const out: ResultDetail[] = step1.beta.map((b, i) => ({ key: `beta${i + 1}`, label: `Coefficient on ${step1.names.xs[i]}`, value: b }));
  if (step1.intercept !== null) out.push({ key: 'intercept', label: 'Intercept', value: step1.intercept });
  if (step1.trendCoefficient !== null) out.push({ key: 'trendCoefficient', label: 'Coefficient on the trend t = 1..T', value: step1.trendCoefficient });
  out.push(
    { key: 'relation', label: 'Equilibrium error (the residual)', value: relationText(step1) },
    { key: 'rSquared', label: 'R² of the cointegrating regression', value: step1.rSquared },
    { key: 'residualSsr', label: 'Residual sum of squares', value: step1.fit.ssr },
  );
  return out;
}

/** "X and Y are cointegrated at the 5% level (tau = -4.1, p = 0.004): X - 1.02 Y - 3.1 is stationary." */
export function residualTestVerdict(test: TestResult, step1: CointegratingRegression, alpha: number): string {
  const all = listText([step1.names.y, ...step1.names.xs]);
  const stat = `${test.statisticName} = ${formatCoefficient(test.statistic)}, ${formatPValue(test.pValue)}`;
  const decision = rejects(test, alpha);
  if (decision === null) return `${all}: the ${levelText(alpha)} decision is not available (${stat}); no table covers ${step1.nVariables} variables at this level.`;
  return decision
    ? `${all} are cointegrated at the ${levelText(alpha)} level (${stat}): ${relationText(step1)} is stationary.`
    : `No evidence at the ${levelText(alpha)} level that ${all} are cointegrated (${stat}).`;
}
