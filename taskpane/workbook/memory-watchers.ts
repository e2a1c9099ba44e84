/**
 * Change watchers of the in-memory workbook. A watcher covers a table (by name, so it follows
 * the table as rows are appended) or a plain region (its cells and the row just below it,
 * where appended rows land; the region then grows to its new current region). Changes made
 * in one synchronous step are reported once, on a microtask, as Office reports them after
 * the change rather than inside it; no timers.
 */
import { rangeAddress, type CellRange } from './a1-address';
import type { RegionChange } from './port';

/** What a watcher follows. */
export type WatchTarget = { kind: 'table'; table: string } | { kind: 'region'; sheet: string; range: CellRange };

interface Watcher {
  target: WatchTarget;
  onChange: (change: RegionChange) => void;
  pending: boolean;
}

/** How the watchers ask the workbook where a target now lies. */
export interface WatchLookup {
  /** The table's sheet and range, or null when it is gone. */
  table(name: string): { sheet: string; range: CellRange } | null;
  /** The current region around a cell (for a plain region that grew). */
  regionAt(sheet: string, row: number, col: number): CellRange;
}

/** The watchers of one workbook. */
export class MemoryWatchers {
  private readonly list: Watcher[] = [];
  private scheduled = false;

  constructor(private readonly lookup: WatchLookup) {}

  /** Adds a watcher; returns the function that removes it. */
  add(target: WatchTarget, onChange: (change: RegionChange) => void): () => void {
    const w: Watcher = { target, onChange, pending: false };
    this.list.push(w);
    return () => {
      const i = this.list.indexOf(w);
      if (i >= 0) this.list.splice(i, 1);
    };
  }

  /** Records that cells in `range` on `sheet` changed (or a table grew); notices follow on a microtask. */
  touched(sheet: string, range: CellRange): void {
    for (const w of this.list) {
      const area = this.area(w.target);
      if (!area || area.sheet !== sheet) continue;
      const watched = { ...area.range, bottom: area.range.bottom + 1 };
      const hit = range.left <= watched.right && watched.left <= range.right && range.top <= watched.bottom && watched.top <= range.bottom;
      if (hit) w.pending = true;
    }
    if (!this.scheduled && this.list.some((w) => w.pending)) {
      this.scheduled = true;
      queueMicrotask(() => this.flush());
    }
  }

  private area(target: WatchTarget): { sheet: string; range: CellRange } | null {
    return target.kind === 'table' ? this.lookup.table(target.table) : { sheet: target.sheet, range: target.range };
  }

  private flush(): void {
    this.scheduled = false;
    for (const w of this.list.slice()) {
      if (!w.pending) continue;
      w.pending = false;
      let area = this.area(w.target);
      if (!area) continue;
      if (w.target.kind === 'region') {
        const grown = this.lookup.regionAt(area.sheet, area.range.top, area.range.left);
        w.target = { kind: 'region', sheet: area.sheet, range: grown };
        area = { sheet: area.sheet, range: grown };
      }
      w.onChange({ sheet: area.sheet, address: rangeAddress(area.range), rowCount: area.range.bottom - area.range.top });
    }
  }
}
