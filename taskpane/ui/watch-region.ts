/**
 * Watching the source data: the pane asks the port to call back when the table (or range)
 * it read changes. Watching is a convenience, so a port that cannot watch leaves the pane
 * working without it.
 */
import type { DataRegion, RegionChange, WorkbookPort } from '../workbook/port';

/** Starts watching the region; returns the function that stops it (a no-op when watching failed). */
export async function watchRegion(port: WorkbookPort, region: DataRegion, onChange: (change: RegionChange) => void): Promise<() => void> {
  try {
    return await port.watch(region.sheet, region.address, onChange);
  } catch {
    return () => undefined;
  }
}
