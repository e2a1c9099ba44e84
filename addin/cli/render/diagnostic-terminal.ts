/**
 * The readable terminal form of the pairwise diagnostic: the data line, the findings in
 * plain words first, then one table of the series' orders, one block per pair, the system,
 * and the warnings. It lays out the report's fields and computes nothing; the runner adds
 * the closing cautions, and this adds the report's own screening count beside them.
 */
import type { DiagnosticReport } from '../../report/report-types';
import { bullet, formatStatistic, heading, labelled } from './format';
import { renderOtherPairsTerminal, renderPairTerminal, testRow } from './pair-terminal';
import { orderDecidedBy, orderTable } from './order-table';
import { textTable } from './text-table';

/** Where and when: "780 rows, 2022-01-03 to 2024-12-27 (line 2 to line 781), natural logs". */
export function dataLine(report: DiagnosticReport): string {
  const d = report.data;
  const span = d.first.date && d.last.date ? `${d.first.date} to ${d.last.date}` : `${d.first.label} to ${d.last.label}`;
  return `${d.observations} rows, ${span}${d.logged ? ', natural logs' : ''}`;
}

/** Renders the whole report for the terminal (the runner appends the general cautions). */
export function renderDiagnosticTerminal(report: DiagnosticReport, extra: { source?: string; htmlPath?: string } = {}): string {
  const d = report.data;
  const s = report.settings;
  const title = `Pairwise diagnostic of ${report.series.length} series${extra.source ?? d.source ? `: ${extra.source ?? d.source}` : ''}`;
  const out: string[] = [heading(title), ''];
  out.push(labelled('Data', dataLine(report)));
  out.push(labelled('Dropped rows', d.dropped.length === 0 ? 'none' : `${d.dropped.length}: ` + d.dropped.slice(0, 5).map((r) => `${r.series} ${r.row} (${r.reason})`).join('; ') + (d.dropped.length > 5 ? `; ${d.dropped.length - 5} more in --json` : '')));
  out.push(labelled('Settings', `level ${formatLevel(s.alpha)}, lags by ${s.lagRule.toUpperCase()}, rolling window ${s.rollingWindow} ${d.period}s; one row is a ${d.period}, ${d.periodSource}`));
  if (extra.htmlPath) out.push(labelled('HTML report', extra.htmlPath));

  out.push('', `Findings at the ${formatLevel(s.alpha)} level`, '');
  for (const f of report.findings) out.push(bullet(f.text, 2, '*'));

  const orders = orderTable(report);
  const nulls = s.unitRootTest === 'dfgls' ? 'DF-GLS, Ng-Perron MZt and ADF null: unit root' : 'ADF null: unit root';
  out.push('', `Order of integration (p-values; ${nulls}, KPSS null: stationary)`, '', ...textTable(orders.header, orders.rows, orders.textColumns));
  out.push('', labelled('Orders decided by', orderDecidedBy(report)));

  const related = report.pairs.filter((p) => p.cointegration.cointegrated);
  const others = report.pairs.filter((p) => !p.cointegration.cointegrated);
  if (related.length > 0) out.push('', `Pairs with a long-run relation (${related.length})`);
  for (const pair of related) out.push('', renderPairTerminal(pair, report));
  if (others.length > 0) out.push('', renderOtherPairsTerminal(others, report));

  if (report.system) {
    const head = `The system of all ${report.series.length} series`;
    out.push('', head, '-'.repeat(head.length));
    const j = report.system.johansen;
    if (j) {
      out.push('', ...textTable(['Johansen test', 'null hypothesis', 'statistic', 'p-value', `at ${formatLevel(s.alpha)}`], j.trace.map((t, r) => testRow(`trace, r = ${r}`, r === 0 ? 'no relation' : `at most ${r}`, t)), [0, 1, 4]), '');
    }
    if (j) out.push(labelled('Johansen choices', `${j.caseReason} ${j.lagsReason}`));
    out.push(labelled('Verdict', report.system.verdict));
  }

  if (report.warnings.length > 0) {
    out.push('', 'Warnings');
    for (const w of report.warnings) out.push(bullet(w, 2, '!'));
  }
  out.push('', labelled('Screening', report.screening.text));
  return out.join('\n');
}

/** 0.05 as "5%". */
export function formatLevel(alpha: number): string {
  return `${Number((alpha * 100).toPrecision(6))}%`;
}

/** A number for a compact line: the statistic format, or "-" when missing. */
export function shortNumber(x: number | null | undefined): string {
  return x === null || x === undefined ? '-' : formatStatistic(x);
}
