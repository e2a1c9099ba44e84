/**
 * The report's section on the hedge ratio through time is the kalman command's result for the
 * report's pair, as written (dependent on regressor, in logs): the same paths and latest band in
 * report --json, the same words in the terminal and the HTML report, which also draws the path.
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

describe('the report\'s moving hedge ratio', () => {
  const report = json('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').report as DiagnosticReport;
  const pair = report.pairs[0];

  it('is kalman --json on the pair as the report writes it (same numbers)', () => {
    const m = pair.movingHedge!;
    expect(m.dependent).toBe(pair.relation!.dependent);
    const strip = (s: string) => s.replace(/^ln\((.*)\)$/, '$1');
    const k = json('kalman', 'd.csv', '--y', strip(m.dependent), '--x', strip(m.regressor), '--log');
    expect(k.betaSmoothed).toEqual(m.betaSmoothed);
    expect(k.beta).toEqual(m.beta);
    expect(k.stateVar).toBe(m.stateVar);
    expect(k.latest).toEqual(m.latest);
    expect(m.betaSmoothedLow.every((v, t) => v < m.betaSmoothed[t] && m.betaSmoothed[t] < m.betaSmoothedHigh[t])).toBe(true);
  });

  it('stands in the terminal and the HTML report with the latest band and the words on drift', () => {
    const m = pair.movingHedge!;
    const text = run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').stdout.replace(/\s+/g, ' ');
    expect(text).toContain(`Ratio through time ${m.latest.text}`);
    const dir = mkdtempSync(join(tmpdir(), 'mooring-moving-'));
    try {
      const out = join(dir, 'r.html');
      expect(run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log', '--out', out).code).toBe(0);
      const html = readFileSync(out, 'utf8');
      expect(html).toContain('<h4>The hedge ratio through time</h4>');
      expect(html).toContain('aria-label="Hedge ratio of');
      expect(html).toContain('A ratio that drifts is itself evidence that the fixed relation is unstable');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('stands in the pane\'s step on the relation: the latest moving ratio with its band, and the words on drift', async () => {
    const paneReport = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
    const view = relationStepView(paneReport, paneReport.pairs[0]);
    const m = paneReport.pairs[0].movingHedge!;
    const fact = view.lineFacts.find((f) => f.label.includes('allowed to move'));
    expect(fact?.value).toBe(`${m.latest.beta.toFixed(4)} (likely ${m.latest.low.toFixed(4)} to ${m.latest.high.toFixed(4)})`);
    expect(view.lineFacts.find((f) => f.label === 'How it moved')?.value).toContain('A ratio that drifts is itself evidence');
  });
});
