/**
 * The table of the series' orders that the terminal and the HTML report both show, and the words
 * naming the test that decided them. With ADF deciding: ADF and KPSS p-values on the levels and
 * the changes. With DF-GLS deciding the levels (report.settings.unitRootTest): its p-value on the
 * levels joins the table with Ng-Perron's MZt beside it (for comparison: it never decides), and the
 * agreement column names DF-GLS. It picks fields; it computes nothing.
 */
import type { DiagnosticReport, SeriesReport } from '../../report/report-types';
import { formatPValue } from './format';

/** The rows of the orders table, with its header and which columns hold words. */
export function orderTable(report: DiagnosticReport): { header: string[]; rows: string[][]; textColumns: number[] } {
  const gls = report.settings.unitRootTest === 'dfgls';
  const cell = (s: SeriesReport, d: number, test: 'adf' | 'kpss' | 'gls' | 'ngPerron'): string => {
    const found = s.steps.find((x) => x.differences === d)?.[test];
    return found ? formatPValue(found.pValue, found.pValueBound) : '-';
  };
  const header = ['series', 'order', ...(gls ? ['DF-GLS p, levels', 'Ng-Perron MZt p, levels (comparison)'] : []), 'ADF p, levels', 'ADF p, changes', 'KPSS p, levels', 'KPSS p, changes', `${gls ? 'DF-GLS' : 'ADF'} and KPSS`];
  const rows = report.series.map((s) => [
    s.name, s.orderText, ...(gls ? [cell(s, 0, 'gls'), cell(s, 0, 'ngPerron')] : []),
    cell(s, 0, 'adf'), cell(s, 1, 'adf'), cell(s, 0, 'kpss'), cell(s, 1, 'kpss'), s.agree ? 'agree' : 'disagree',
  ]);
  return { header, rows, textColumns: [0, 1, header.length - 1] };
}

/** Which test decided the orders, in a few words. */
export function orderDecidedBy(report: DiagnosticReport): string {
  return report.settings.unitRootTest === 'dfgls' ? 'DF-GLS on the levels, ADF on the changes' : 'ADF';
}
