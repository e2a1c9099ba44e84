import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { renderDiagnosticHtml } from '../../addin/cli/render/diagnostic-html';
import { johansenTest } from '../../addin/johansen/johansen';
import { formatBoundedPValue, pValueBoundNote, pValueBoundText } from '../../addin/p-value-bound';
import { SeededRandom } from '../../addin/random';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { summariseTest } from '../../addin/report/test-summary';
import { rejects } from '../../addin/result';
import { kpssTest } from '../../addin/unitroot/kpss';
import { johansenCell } from '../../functions/analyses/johansen-cells';
import { resultRows } from '../../functions/render/result-rows';
import { showAnswer, testAnswer } from '../../functions/render/show-answer';
import { testRow } from '../../taskpane/ui/views/test-row';
import { runWith } from './cli-harness';

/**
 * A p-value read off a table's end is a bound, and every surface says so: the KPSS table of
 * Kwiatkowski, Phillips, Schmidt & Shin (1992, Table 1) spans p = 0.10 down to 0.01, our
 * simulated Johansen table 0.999 down to 0.001. Beyond them the terminal, the HTML report and
 * the pane print "< 0.01", "> 0.10", "< 0.001", JSON adds pValueBound and pValueNote, and a
 * cell keeps the number with a "p-value reads" row beside it.
 *
 * Data (seeded, SeededRandom 41, 600 rows): Walk a random walk (KPSS eta far beyond the 1% point
 * 0.739, so p < 0.01), Calm white noise around 50 (eta under the 10% point 0.347 on this seed,
 * so p > 0.10), Twin and Echo the walk plus small noise (a Johansen trace far beyond the
 * table's 99.9% quantile, so p < 0.001).
 */
function boundCsv(): string {
  const r = new SeededRandom(41);
  const lines = ['Walk,Calm,Twin,Echo'];
  let walk = 100;
  for (let i = 0; i < 600; i++) {
    walk += r.normal();
    lines.push([walk, 50 + r.normal(), walk + 0.1 * r.normal(), walk + 0.1 * r.normal()].map((v) => v.toFixed(5)).join(','));
  }
  return `${lines.join('\n')}\n`;
}
const csv = boundCsv();
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'b.csv': csv });
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  return JSON.parse(r.stdout) as Record<string, any>;
};
const columnOf = (name: string) => {
  const rows = csv.trim().split('\n');
  const j = rows[0].split(',').indexOf(name);
  return rows.slice(1).map((line) => Number(line.split(',')[j]));
};

describe('the one formatting of a bounded p-value', () => {
  it('prints the bound with its sign and the table\'s own digits, at least two decimals', () => {
    expect(pValueBoundText(0.01, 'below')).toBe('< 0.01');
    expect(pValueBoundText(0.1, 'above')).toBe('> 0.10');
    expect(pValueBoundText(0.001, 'below')).toBe('< 0.001');
    expect(pValueBoundText(0.999, 'above')).toBe('> 0.999');
    expect(pValueBoundText(0.00001, 'below')).toBe('< 0.00001');
    expect(pValueBoundText(0.0123, null)).toBeNull();
    expect(formatBoundedPValue(0.0123, null, (p) => p.toFixed(4))).toBe('0.0123');
    expect(formatBoundedPValue(0.01, 'below', (p) => p.toFixed(4))).toBe('< 0.01');
    expect(pValueBoundNote(0.01, 'below')).toBe("below 0.01: the statistic lies beyond the table's last column");
    expect(pValueBoundNote(0.1, 'above')).toBe("above 0.10: the statistic lies before the table's first column");
  });

  it('a p-value bounded below at exactly the level rejects (the truth is smaller); bounded above it does not', () => {
    const walk = kpssTest(columnOf('Walk'), {}, 'Walk');
    expect([walk.pValue, walk.pValueBound]).toEqual([0.01, 'below']);
    expect(rejects(walk, 0.01)).toBe(true);
    const calm = kpssTest(columnOf('Calm'), {}, 'Calm');
    expect([calm.pValue, calm.pValueBound]).toEqual([0.1, 'above']);
    expect(rejects(calm, 0.1)).toBe(false);
  });
});

describe('KPSS beyond its table on every surface', () => {
  it('kpss: the terminal prints "< 0.01" and "> 0.10", never 0.0100 or 0.1000', () => {
    const oneLine = (text: string) => text.replace(/\s+/g, ' ');
    const walk = run('kpss', 'b.csv', '--series', 'Walk').stdout;
    expect(oneLine(walk)).toMatch(/p-value < 0\.01 \(the statistic lies beyond the table's last column\)/);
    const calm = run('kpss', 'b.csv', '--series', 'Calm').stdout;
    expect(oneLine(calm)).toMatch(/p-value > 0\.10 \(the statistic lies before the table's first column\)/);
    for (const text of [walk, calm]) expect(text).not.toMatch(/0\.0100|0\.1000/);
  });

  it('kpss --json: pValue stays the number, with pValueBound and pValueNote beside it', () => {
    expect(json('kpss', 'b.csv', '--series', 'Walk')).toMatchObject({
      pValue: 0.01, pValueBound: 'below', pValueNote: "below 0.01: the statistic lies beyond the table's last column",
    });
    expect(json('kpss', 'b.csv', '--series', 'Calm')).toMatchObject({ pValue: 0.1, pValueBound: 'above', pValueNote: "above 0.10: the statistic lies before the table's first column" });
  });

  it('order: the step table reads "< 0.01" and each step\'s KPSS JSON carries the bound', () => {
    const text = run('order', 'b.csv', '--series', 'Walk').stdout;
    const levels = text.split('\n').find((l) => /^\s+levels\s/.test(l)) as string;
    expect(levels).toMatch(/< 0\.01\s+yes$/);
    const o = json('order', 'b.csv', '--series', 'Walk');
    const step = o.steps.find((s: any) => s.differences === 0);
    expect(step.kpss).toMatchObject({ pValue: 0.01, pValueBound: 'below' });
    expect(step.kpss.pValueNote).toMatch(/^below 0\.01: /);
  });
});

describe('Johansen beyond its table on every surface', () => {
  it('johansen: the table prints "< 0.001" with a line saying it is a bound; JSON has the bound and note per rank', () => {
    const text = run('johansen', 'b.csv', '--series', 'Twin,Echo').stdout;
    const first = text.split('\n').find((l) => /^\s+r <= 0/.test(l)) as string;
    expect(first.match(/< 0\.001/g)).toHaveLength(2);
    expect(text).not.toMatch(/0\.0010/);
    expect(text).toMatch(/"< 0\.001" or "> 0\.999" is a bound/);
    const o = json('johansen', 'b.csv', '--series', 'Twin,Echo');
    expect(o.tracePValue[0]).toBe(0.001);
    expect(o.tracePValueBound).toEqual(['below', null]);
    expect(o.maxEigenPValueBound[0]).toBe('below');
    expect(o.tracePValueNote[0]).toBe("below 0.001: the statistic lies beyond the table's last column");
    expect(o.tracePValueNote[1]).toBeNull();
  });

  it('report: the system table in the terminal and in the HTML page read "< 0.001"; the report JSON carries the bound', () => {
    const text = run('report', 'b.csv', '--series', 'Walk,Twin,Echo').stdout;
    const system = text.slice(text.indexOf('The system of all 3 series'));
    expect(system.split('\n').find((l) => /trace, r = 0/.test(l))).toMatch(/< 0\.001\s+rejects/);
    expect(system).not.toMatch(/0\.0010/);
    const report = json('report', 'b.csv', '--series', 'Walk,Twin,Echo').report as DiagnosticReport;
    const trace0 = report.system?.johansen?.trace[0];
    expect(trace0).toMatchObject({ pValue: 0.001, pValueBound: 'below' });
    expect(trace0?.pValueNote).toMatch(/^below 0\.001: /);
    const walkLevels = report.series.find((s) => s.name === 'Walk')?.steps.find((s) => s.differences === 0);
    expect(walkLevels?.kpss).toMatchObject({ pValue: 0.01, pValueBound: 'below' });
    const html = renderDiagnosticHtml(report);
    expect(html).toMatch(/<td[^>]*>&lt; 0\.001<\/td>/);
    expect(html).toMatch(/<td[^>]*>&lt; 0\.01<\/td>/);
    expect(html).not.toMatch(/>0\.0010<|>0\.0100</);
  });
});

describe('the pane and the cells', () => {
  it('the pane\'s test row reads "< 0.01" and keeps the note', () => {
    const row = testRow('Steadiness (KPSS)', summariseTest(kpssTest(columnOf('Walk'), {}, 'Walk'), 0.05));
    expect(row.pValue).toBe('< 0.01');
    expect(row.note).toMatch(/^below 0\.01: /);
    const calm = testRow('Steadiness (KPSS)', summariseTest(kpssTest(columnOf('Calm'), {}, 'Calm'), 0.05));
    expect(calm.pValue).toBe('> 0.10');
  });

  it('a cell keeps the number for comparisons and adds a "p-value reads" row; the card\'s text shows the bound', () => {
    const result = kpssTest(columnOf('Walk'), {}, 'Walk');
    const rows = resultRows(result);
    expect(rows.find((r) => r.key === 'pValue')?.value).toBe(0.01);
    expect(rows.find((r) => r.key === 'pValueReads')).toEqual({ key: 'pValueReads', label: 'p-value reads', value: '< 0.01' });
    expect(showAnswer(testAnswer(result), 'headline')).toEqual([[0.01]]);
    const [[card]] = showAnswer(testAnswer(result), 'card', () => true) as Excel.EntityCellValue[][];
    expect(card.text).toBe('KPSS: p-value < 0.01');
    expect(card.properties?.pValueReads).toMatchObject({ basicValue: '< 0.01' });
    // an exact p-value gets no such row
    expect(resultRows({ ...result, pValue: 0.03, pValueBound: null, pValueNote: undefined }).some((r) => r.key === 'pValueReads')).toBe(false);
  });

  it('MOOR.JOHANSEN\'s table reads "< 0.001" beside each bounded p-value of the rank sequence', () => {
    const block = columnOf('Twin').map((v, i) => [v, columnOf('Echo')[i]]);
    const table = johansenCell(block, 1, 'constant', 'all') as unknown[][];
    const reads = (label: string) => table.find((r) => r[0] === label)?.[1];
    expect(reads('p-value reads')).toBe('< 0.001');
    expect(reads('p-value reads, trace, at most 0 relations')).toBe('< 0.001');
    expect(reads('p-value, trace, at most 0 relations')).toBe(0.001);
    const direct = johansenTest([columnOf('Twin'), columnOf('Echo')], { lags: 1, case: 'constant' }, ['Twin', 'Echo']);
    expect(reads('p-value reads, trace, at most 1 relations')).toBe(direct.trace[1].pValueBound ? pValueBoundText(direct.trace[1].pValue, direct.trace[1].pValueBound) : undefined);
  });
});
