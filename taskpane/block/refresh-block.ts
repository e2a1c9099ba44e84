/**
 * Refreshing and removing a written block by its workbook-level name. Refresh re-reads the
 * source (the table at its current size, or the recorded range), runs the diagnostic again,
 * rebuilds the block in the same place and writes it over the old one in one write (the plan
 * pads it to the old block's size, so no stale row is left below); the fixed numbers (a lead-lag test
 * with no cell function), the warnings and the chart's extent are then current again. It
 * stops, writing nothing, when the new block would reach cells that are not its own.
 */
import { MooringInputError } from '../../addin/errors';
import type { DiagnosticOptions } from '../../addin/report/pairwise-diagnostic';
import { cellAddress, parseRange } from '../workbook/a1-address';
import type { DataRegion, WorkbookPort } from '../workbook/port';
import { decodeBlockNote, type BlockNote } from './block-note';
import { buildPairBlock } from './pair-block';
import { planBlockWrite, writePlannedBlock, type PlannedWriteOutcome } from './plan-block-write';
import { regionReport } from './region-report';

/** The source region a note points at, at its current size. */
async function sourceOf(port: WorkbookPort, note: BlockNote): Promise<DataRegion> {
  if (note.table && port.readTable) return port.readTable(note.table);
  if (!note.address) throw new MooringInputError(`The block's note names table ${note.table ?? '?'} but this workbook cannot read tables by name: write the block again from the pane.`);
  return port.readRegion(note.sheet, note.address);
}

/** Re-finds the block by name and rewrites it from the current data. */
export async function refreshBlock(port: WorkbookPort, name: string, options: DiagnosticOptions = {}): Promise<PlannedWriteOutcome> {
  const found = await port.findBlock(name);
  if (!found) throw new MooringInputError(`There is no Mooring block named ${name} in this workbook: it may have been removed; write it again from the pane.`, name);
  const note = decodeBlockNote(found.note ?? null);
  if (!note) throw new MooringInputError(`The name ${name} does not say where its data came from: write the block again from the pane.`, name);
  const region = await sourceOf(port, note);
  // The analysis the block was written with, unless the caller says otherwise.
  const recorded: DiagnosticOptions = note.analysis
    ? {
        preparation: note.analysis.preparation,
        alpha: note.analysis.alpha,
        deterministic: note.analysis.deterministic as DiagnosticOptions['deterministic'],
        lagRule: note.analysis.lagRule as DiagnosticOptions['lagRule'],
        johansenCase: note.analysis.johansenCase as DiagnosticOptions['johansenCase'],
        unitRootTest: note.analysis.unitRootTest as DiagnosticOptions['unitRootTest'],
      }
    : {};
  const report = regionReport(region, [note.a, note.b], { ...recorded, ...options });
  const old = parseRange(found.address);
  // The block keeps its own name (a second block of the same pair elsewhere has another).
  const { block, chart } = buildPairBlock(report, { a: note.a, b: note.b }, region, { sheet: found.sheet, anchor: cellAddress({ row: old.top, col: old.left }) }, name);
  const plan = await planBlockWrite(port, block, chart);
  if (!plan.safe) return writePlannedBlock(port, plan, false);
  return writePlannedBlock(port, plan, true);
}

/** Removes the block, its chart and its name; false when there was no block of that name. */
export async function removeBlock(port: WorkbookPort, name: string): Promise<boolean> {
  const found = await port.findBlock(name);
  if (!found) return false;
  await port.removeBlock(name);
  return true;
}
