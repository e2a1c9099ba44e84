/**
 * A block under construction: rows of cells added one at a time from a fixed anchor, so
 * every cell knows its own sheet address before the block is written (a reading's formula
 * points at the number beside it, the latest z-score at the spill of z-scores).
 */
import { cellAddress, parseCell, type CellPosition } from '../workbook/a1-address';
import type { BlockCell } from '../workbook/port';

/** Columns of the block, left to right. */
export const COL = { label: 0, value: 1, reading: 2, how: 3, gap: 4, chart: 5 } as const;

/** Rows of BlockCells anchored at one cell. */
export class BlockGrid {
  readonly rows: BlockCell[][] = [];
  readonly anchor: CellPosition;

  constructor(anchor: string, readonly width: number) {
    this.anchor = parseCell(anchor);
  }

  /** Index of the next row to be added. */
  get next(): number {
    return this.rows.length;
  }

  /** Sheet address of column `col` in block row `row` (relative, such as K9). */
  address(row: number, col: number): string {
    return cellAddress({ row: this.anchor.row + row, col: this.anchor.col + col });
  }

  /** Adds a row from cells by column; returns its block row index. */
  add(cells: Partial<Record<number, BlockCell>>): number {
    const row: BlockCell[] = [];
    for (let c = 0; c < this.width; c++) row.push(cells[c] ?? {});
    this.rows.push(row);
    return this.rows.length - 1;
  }

  /** Sets one cell of a row already added. */
  set(row: number, col: number, cell: BlockCell): void {
    this.rows[row][col] = cell;
  }

  /** An empty row. */
  blank(): void {
    this.add({});
  }
}
