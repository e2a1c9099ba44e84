/**
 * The report's forecast of a related pair is the forecast command's answer for the same series,
 * case, lags and rank 1 (same numbers), on the business days after the demo's last day; the HTML
 * report draws the fan and says how the bands are made; the terminal says where the pair heads.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { runWith } from '../cli/cli-harness';
import { relationStepView } from '../../taskpane/ui/views/relation-view';
import { COLUMN, DEMO_CSV, demoReport } from '../pane/demo-reports';

const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'd.csv': DEMO_CSV });
const json = (...argv: string[]) => JSON.parse(run(...argv, '--json').stdout) as Record<string, any>;

describe('the report\'s forecast', () => {
  const report = json('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').report as DiagnosticReport;
  const pair = report.pairs[0];
  const f = pair.forecast!;

  it('is forecast --json on the pair as written, with the report\'s case and lags and one relation', () => {
    const strip = (s: string) => s.replace(/^ln\((.*)\)$/, '$1');
    expect(f.series).toEqual([pair.relation!.dependent, pair.relation!.regressor]);
    expect(f.case).toBe(pair.cointegration.johansen!.case);
    const out = json('forecast', 'd.csv', '--series', f.series.map(strip).join(','), '--log', '--case', f.case, '--lags', String(f.lags), '--rank', '1', '--horizon', String(f.horizon));
    expect(out.forecast).toEqual(f.forecast);
    expect(out.upper).toEqual(f.upper);
    expect(out.spread.path).toEqual(f.spread.path);
    expect(out.dates).toEqual(f.dates);
    // The demo ends on Friday 2024-12-27: business days follow.
    expect(f.dates!.slice(0, 2)).toEqual(['2024-12-30', '2024-12-31']);
  });

  it('is drawn in the HTML report with the band note, and summed up in the terminal', () => {
    const text = run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').stdout.replace(/\s+/g, ' ');
    expect(text).toContain(`by ${f.dates![f.horizon - 1]}`);
    const dir = mkdtempSync(join(tmpdir(), 'mooring-forecast-'));
    try {
      const out = join(dir, 'r.html');
      expect(run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log', '--out', out).code).toBe(0);
      const html = readFileSync(out, 'utf8');
      expect(html).toContain('Where it is heading (error-correction forecast, 20 rows ahead');
      expect(html).toContain('ignoring the uncertainty of the estimated coefficients');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('stands in the pane\'s step on the relation: the spread\'s forecast with its band, and the band note', async () => {
    const paneReport = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
    const pf = paneReport.pairs[0].forecast!;
    const view = relationStepView(paneReport, paneReport.pairs[0]);
    const fact = view.pullFacts.find((x) => x.label.startsWith('Where the spread'));
    expect(fact?.value.startsWith(`${pf.spread.path[19].toFixed(4)} (likely ${pf.spread.lower[19].toFixed(4)} to ${pf.spread.upper[19].toFixed(4)}`)).toBe(true);
    expect(view.pullFacts.find((x) => x.label === 'How sure the forecast is')?.value).toContain('ignoring the uncertainty of the estimated coefficients');
  });
});
