/**
 * The terminal block for an order-of-integration result: the verdict, a table of the ADF and
 * KPSS tests behind it (in the order they ran), and the warnings of the whole decision and of
 * each test.
 */
import type { IntegrationOrderResult, OrderStep } from '../../unitroot/integration-order';
import { DETERMINISTIC_LABEL } from '../../result';
import { bullet, formatPValue, formatStatistic, heading, labelled } from './format';

const DIFFERENCE_WORDS = ['levels', 'changes', 'changes of changes'];

function orderWord(order: IntegrationOrderResult['order']): string {
  return order === 'above 2' ? 'above 2' : `I(${order})`;
}

function row(cells: readonly string[], widths: readonly number[]): string {
  return `  ${cells.map((c, j) => (j === 0 ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  ')}`.trimEnd();
}

function stepCells(step: OrderStep): string[] {
  return [
    DIFFERENCE_WORDS[step.differences] ?? `${step.differences} differences`,
    formatStatistic(step.adf.statistic),
    formatPValue(step.adf.pValue, step.adf.pValueBound),
    step.adfRejects ? 'yes' : 'no',
    formatStatistic(step.kpss.statistic),
    formatPValue(step.kpss.pValue, step.kpss.pValueBound),
    step.kpssRejects ? 'yes' : 'no',
  ];
}

/** Renders an order-of-integration result as a terminal block (the caller appends the cautions). */
export function renderOrderTerminal(result: IntegrationOrderResult): string {
  const out: string[] = [heading(`Order of integration of ${result.name}`), ''];
  // the unit-root tests that decided: ADF, or DF-GLS on the levels when asked
  const decider = result.steps.some((s) => s.adf.test !== 'ADF') ? 'DF-GLS/ADF' : 'ADF';
  out.push(labelled('Order', `${orderWord(result.order)}${result.agree ? `, ${decider} and KPSS agree` : `, ${decider} and KPSS disagree`}`));
  out.push(labelled('Verdict', result.verdict));
  out.push(labelled('Deterministic terms', `${DETERMINISTIC_LABEL[result.deterministic]} in levels; differences take a constant unless none was asked`));
  out.push('', `  Tests, in the order they ran (${decider} null: unit root; KPSS null: stationary)`, '');
  const header = ['series tested', `${decider} tau`, 'p-value', 'rejects', 'KPSS eta', 'p-value', 'rejects'];
  const body = result.steps.map(stepCells);
  const widths = header.map((h, j) => Math.max(h.length, ...body.map((b) => b[j].length)));
  out.push(row(header, widths), ...body.map((b) => row(b, widths)));
  const notes = [...result.warnings];
  for (const step of result.steps) {
    const on = DIFFERENCE_WORDS[step.differences] ?? `${step.differences} differences`;
    for (const t of [step.adf, step.kpss]) {
      for (const w of t.warnings) notes.push(`${t.test} on ${on}: ${w}`);
    }
  }
  if (notes.length > 0) {
    out.push('', 'Warnings');
    for (const w of notes) out.push(bullet(w, 2, '!'));
  }
  return out.join('\n');
}
