/**
 * The readable terminal block for any TestResult: the headline statistic and p-value, a
 * plain-words reading at the 5% level, then the settings and hypotheses, the test's own
 * details and its warnings. Generic over TestResult, so every test prints through it.
 */
import { pValueBoundReason } from '../../p-value-bound';
import { rejects, DETERMINISTIC_LABEL, type TestResult } from '../../result';
import { bullet, formatDetail, formatPValue, formatStatistic, heading, labelled } from './format';

/** The level the plain-words reading uses. */
export const READING_LEVEL = 0.05;

const LAG_RULE_WORDS: Record<string, string> = {
  fixed: 'as given',
  aic: 'chosen by AIC',
  bic: 'chosen by BIC',
  tstat: 'chosen by the t-statistic rule (longest lag whose coefficient is significant)',
};

/** The plain-words reading of a result at 5%. */
export function readingAt5(result: TestResult): string {
  const verdict = rejects(result, READING_LEVEL);
  const by = result.pValue === null ? ' (by the 5% critical value)' : '';
  if (verdict === true) return `rejected at 5%${by}: the data speak against the null hypothesis and favour the alternative.`;
  if (verdict === false) return `not rejected at 5%${by}: the data are consistent with the null hypothesis, which is not proof of it.`;
  return 'no reading at 5%: the result has neither a p-value nor a 5% critical value.';
}

/** Critical values on one line: "1%: -3.4634   5%: -2.8761   10%: -2.5746". */
export function criticalLine(critical: Record<string, number>): string {
  const entries = Object.entries(critical);
  if (entries.length === 0) return 'not available';
  return entries.map(([level, v]) => `${level}: ${formatStatistic(v)}`).join('   ');
}

/**
 * The p-value line's value: the number (or its bound, with the reason), or, when there is no
 * p-value, the engine's note alone ("not available: only critical values are published")
 * rather than "not available (not available: ...)".
 */
export function pValueText(result: TestResult): string {
  const bound = result.pValueBound ?? null;
  const shown = formatPValue(result.pValue, bound);
  if (bound !== null) return `${shown} (${pValueBoundReason(bound)})`;
  if (!result.pValueNote) return shown;
  if (result.pValue === null && result.pValueNote.startsWith(shown)) return result.pValueNote;
  return `${shown} (${result.pValueNote})`;
}

/** Renders one test result as a terminal block (no cautions: the caller appends those once). */
export function renderTestTerminal(result: TestResult): string {
  const out: string[] = [heading(result.title), ''];
  out.push(labelled(`Statistic (${result.statisticName})`, formatStatistic(result.statistic)));
  out.push(labelled('p-value', pValueText(result)));
  out.push(labelled('Reading', readingAt5(result)));
  out.push('');
  out.push(labelled('Critical values', criticalLine(result.critical)));
  out.push(labelled('Rejects when', result.rejectTail === 'lower' ? 'the statistic is below the critical value' : 'the statistic is above the critical value'));
  if (result.lags !== null) {
    const rule = result.lagRule ? LAG_RULE_WORDS[result.lagRule] ?? `chosen by ${result.lagRule}` : '';
    out.push(labelled('Lagged differences', rule ? `${result.lags}, ${rule}` : String(result.lags)));
  }
  if (result.bandwidth !== undefined) {
    out.push(labelled('Bandwidth', `${result.bandwidth} lag${result.bandwidth === 1 ? '' : 's'} in the Bartlett kernel`));
  }
  out.push(labelled('Observations', String(result.nobs)));
  out.push(labelled('Deterministic terms', DETERMINISTIC_LABEL[result.deterministic] ?? result.deterministic));
  out.push(labelled('Null hypothesis', result.nullHypothesis));
  out.push(labelled('Alternative', result.alternative));
  const shown = result.details.filter((d) => d.value !== null);
  if (shown.length > 0) {
    out.push('');
    for (const d of shown) out.push(labelled(d.label, formatDetail(d.value, d.key)));
  }
  if (result.warnings.length > 0) {
    out.push('', 'Warnings');
    for (const w of result.warnings) out.push(bullet(w, 2, '!'));
  }
  return out.join('\n');
}
