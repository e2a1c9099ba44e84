/**
 * Shared set-up for the block tests: the demo data (addin/demo/data/quennel-delta.csv) as
 * table QuennelPrices on sheet Prices of an in-memory workbook, the diagnostic report of
 * GateGasoil and DockDiesel over that table, and the pair's block beside the table.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { buildPairBlock, type PairBlock } from '../../taskpane/block/pair-block';
import { regionReport } from '../../taskpane/block/region-report';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import type { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import type { DataRegion } from '../../taskpane/workbook/port';
import type { DiagnosticReport } from '../../addin/report/report-types';

/** The demo CSV text. */
export const DEMO_CSV = readFileSync(fileURLToPath(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url)), 'utf8');

/** The pair every block test uses. */
export const PAIR = { a: 'GateGasoil', b: 'DockDiesel' };

/** A fresh demo workbook with its table region, report and block. */
export async function demoBlock(): Promise<{ wb: MemoryWorkbook; region: DataRegion; report: DiagnosticReport; built: PairBlock }> {
  const wb = loadCsvTable(DEMO_CSV);
  const region = await wb.readTable!('QuennelPrices');
  const report = regionReport(region, [PAIR.a, PAIR.b]);
  return { wb, region, report, built: buildPairBlock(report, PAIR, region) };
}

/** The block row whose label cell starts with `label`, as its sheet row number (1-based). */
export function rowOf(built: PairBlock, label: string): number {
  const i = built.block.cells.findIndex((r) => typeof r[0]?.value === 'string' && (r[0].value as string).startsWith(label));
  if (i < 0) throw new Error(`no row labelled ${label}`);
  return i + 1; // the demo block is anchored in row 1
}
