/**
 * Reports of the demo data for the pane's view-model tests, made the way the pane makes
 * them: the demo CSV loaded into the in-memory workbook as a table, the region found around
 * a selected cell, the chosen columns prepared by the pane's data step and diagnosed by the
 * engine. Each report is made once per test file.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { prepareData, type DataChoice } from '../../taskpane/ui/data/prepare-data';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import type { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import type { DataRegion } from '../../taskpane/workbook/port';

/** The demo CSV text. */
export const DEMO_CSV = readFileSync(fileURLToPath(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url)), 'utf8');

/** Column indices of the demo table (0 is Date). */
export const COLUMN = { GateGasoil: 1, DockDiesel: 2, HeavyFuel: 3, BunkerBlend: 4, BargeFreight: 5, TankPremium: 6 } as const;

/** The demo workbook with B2 selected, and its region. */
export async function demoRegion(): Promise<{ workbook: MemoryWorkbook; region: DataRegion }> {
  const workbook = loadCsvTable(DEMO_CSV);
  workbook.select('Prices', 'B2');
  const region = await workbook.regionAroundSelection();
  if (!region) throw new Error('the demo table was not found around B2');
  return { workbook, region };
}

/** The first step's choices with defaults: logs, gaps skipped, every row, 5%. */
export function choiceOf(columns: number[], patch: Partial<DataChoice> = {}): DataChoice {
  return { columns, log: true, skipGaps: true, from: null, to: null, alpha: 0.05, ...patch };
}

/** The report of the chosen columns, as the pane would run it. */
export async function demoReport(columns: number[], patch: Partial<DataChoice> = {}): Promise<DiagnosticReport> {
  const { region } = await demoRegion();
  const choice = choiceOf(columns, patch);
  const prepared = prepareData(region, choice);
  return diagnose(prepared.input, { log: choice.log, alpha: choice.alpha, window: prepared.window });
}
