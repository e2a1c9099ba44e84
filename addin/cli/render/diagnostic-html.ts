/**
 * The pairwise diagnostic as one self-contained HTML page: no scripts, no external files,
 * a strict content security policy (nothing may load; only the page's own inline style
 * applies), inline SVG charts drawn from the report's numbers, and every text from the data
 * escaped. Laid out in reading order: what the data are, the cautions, the findings, the
 * series, each pair, the system, the warnings.
 */
import type { DiagnosticReport } from '../../report/report-types';
import { formatPValue } from './format';
import { el, escapeHtml, htmlTable } from './html-text';
import { orderDecidedBy, orderTable } from './order-table';
import { renderPairHtml } from './pair-html';
import { PAGE_STYLE } from './report-style';
import { lineChart } from './svg-chart';

/** The policy of the page: nothing loads, no script runs, only the inline style applies. */
export const REPORT_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'";

/**
 * The mark of a report Mooring wrote, in the head of every page: `report --out` replaces an
 * existing file only when it carries this mark (report-file.ts).
 */
export const REPORT_MARKER = '<meta name="generator" content="Mooring pairwise diagnostic">';

/** Line colours of the series chart, in series order (repeating after twelve). */
export const SERIES_COLOURS = ['#1f5f66', '#b4552f', '#5a4a86', '#8a7a1e', '#3f7f4f', '#9a3f63', '#2f6f9f', '#6f5a3a', '#4f8f8f', '#c07a2a', '#5f5f5f', '#7f3f2f'];

function dataSummary(report: DiagnosticReport): string {
  const d = report.data;
  const span = d.first.date && d.last.date ? `${d.first.date} to ${d.last.date}` : `${d.first.label} to ${d.last.label}`;
  const items = [
    `${d.observations} rows, ${span}${d.logged ? ', natural logs of the prices' : ''}.`,
    `One row is a ${d.period} (${d.periodSource}).`,
    d.window ? `Window: rows ${d.window.start + 1} to ${d.window.end} of the cleaned series.` : '',
    d.dropped.length === 0 ? 'No rows were dropped.' : `${d.dropped.length} cell${d.dropped.length === 1 ? ' was' : 's were'} dropped as gaps (listed below).`,
    `Level of every decision: ${Number((report.settings.alpha * 100).toPrecision(6))}%; lag orders by ${report.settings.lagRule.toUpperCase()}.`,
    `Orders of integration decided by ${orderDecidedBy(report)}.`,
  ].filter((s) => s !== '');
  return `<ul class="data">${items.map((s) => el('li', s)).join('')}</ul>`;
}

function droppedTable(report: DiagnosticReport): string {
  const rows = report.data.dropped;
  if (rows.length === 0) return '';
  return `<details><summary>${escapeHtml(`Dropped cells (${rows.length})`)}</summary>` +
    htmlTable(['series', 'row', 'reason'], rows.map((r) => [r.series, r.row, r.reason]), [0, 1, 2]) + '</details>';
}

function seriesPart(report: DiagnosticReport): string {
  const rebased = report.series.every((s) => s.chart.kind === 'rebased');
  const chart = lineChart({
    title: rebased ? 'The series, rebased to 100 at the first row' : 'The series, standardised',
    width: 860,
    height: 280,
    xLabels: report.data.dates ?? report.data.rowLabels,
    lines: report.series.map((s, i) => ({ values: s.chart.values, colour: SERIES_COLOURS[i % SERIES_COLOURS.length], label: s.name })),
  });
  const orders = orderTable(report);
  const table = htmlTable(orders.header, orders.rows, orders.textColumns);
  const caption = rebased
    ? 'Each series as 100 times its value over its first value (for logs, the price ratio), so series in different units share one axis.'
    : 'Each series minus its mean, over its standard deviation (some values are zero or negative, so they cannot be rebased).';
  return `<figure>${chart}${el('figcaption', caption)}</figure>\n${table}\n` +
    el('p', `ADF${report.settings.unitRootTest === 'dfgls' ? ', DF-GLS and Ng-Perron\'s MZt test' : ' tests'} the null of a unit root (the level wanders); KPSS the null of stationarity. An I(1) series wanders in levels and is stationary in changes.${report.settings.unitRootTest === 'dfgls' ? ' MZt keeps its error rate when the changes are autocorrelated; it is shown for comparison and does not decide the order.' : ''}`, 'note');
}

function systemPart(report: DiagnosticReport): string {
  const sys = report.system;
  if (!sys) return '';
  const parts = [`<section><h2>${escapeHtml(`The system of all ${report.series.length} series`)}</h2>`, el('p', sys.verdict)];
  const j = sys.johansen;
  if (j) {
    parts.push(htmlTable(['null hypothesis', 'trace', 'p-value', 'decision'], j.trace.map((t, r) => [
      r === 0 ? 'no long-run relation' : `at most ${r}`,
      t.statistic === null ? '-' : t.statistic.toFixed(2),
      formatPValue(t.pValue, t.pValueBound),
      t.rejects === null ? 'no decision' : t.rejects ? 'rejects' : 'does not reject',
    ]), [0, 3]), el('p', `${j.caseReason} ${j.lagsReason}`, 'note'));
  }
  parts.push('</section>');
  return parts.join('\n');
}

/** The whole report as an HTML document. */
export function renderDiagnosticHtml(report: DiagnosticReport): string {
  const title = `Pairwise diagnostic${report.data.source ? ` of ${report.data.source}` : ''}`;
  const names = report.series.map((s) => s.name).join(', ');
  const anchors = report.pairs.map((_, i) => `pair-${i + 1}`);
  const contents = report.pairs.map((p, i) => `<li><a href="#${anchors[i]}">${escapeHtml(`${p.a} and ${p.b}`)}</a></li>`).join('');
  const body = [
    '<header>',
    el('p', 'Mooring', 'brand'),
    el('h1', title),
    el('p', names, 'names'),
    '</header>',
    `<section class="caution"><h2>Before you act on this</h2><ul>${report.cautions.map((c) => el('li', c)).join('')}</ul></section>`,
    `<section><h2>The data</h2>${dataSummary(report)}${droppedTable(report)}</section>`,
    `<section><h2>${escapeHtml(`Findings at the ${Number((report.settings.alpha * 100).toPrecision(6))}% level`)}</h2>`,
    `<ol class="findings">${report.findings.map((f) => el('li', f.text)).join('')}</ol></section>`,
    report.warnings.length > 0 ? `<section><h2>Warnings</h2><ul class="warnings">${report.warnings.map((w) => el('li', w)).join('')}</ul></section>` : '',
    `<section><h2>The series</h2>${seriesPart(report)}</section>`,
    `<section><h2>${escapeHtml(`The pairs (${report.pairs.length})`)}</h2><ol class="contents">${contents}</ol>`,
    ...report.pairs.map((p, i) => renderPairHtml(p, report, anchors[i])),
    '</section>',
    systemPart(report),
    `<footer>${el('p', `Mooring pairwise diagnostic, report version ${report.version}. Statistical evidence about past prices, not advice to trade.`)}</footer>`,
  ].filter((s) => s !== '');
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    REPORT_MARKER,
    `<meta http-equiv="Content-Security-Policy" content="${escapeHtml(REPORT_CSP)}">`,
    '<meta name="referrer" content="no-referrer">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    el('title', title),
    `<style>${PAGE_STYLE}</style>`,
    '</head>',
    '<body>',
    '<main>',
    ...body,
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
