/**
 * The current region around a cell, as Excel's Ctrl+* finds it: the smallest rectangle that
 * holds the cell and is bounded on every side by empty rows and columns (diagonal neighbours
 * count, so a block touching at a corner joins). Null when the cell and all its neighbours are
 * empty.
 */
import { MAX_COL, MAX_ROW, type CellPosition, type CellRange } from './a1-address';

/** Grows a rectangle from `start` while any cell on its border ring is filled. */
export function currentRegion(isFilled: (row: number, col: number) => boolean, start: CellPosition): CellRange | null {
  let r: CellRange = { top: start.row, left: start.col, bottom: start.row, right: start.col };
  let any = isFilled(start.row, start.col);
  for (let grew = true; grew; ) {
    grew = false;
    const ring: [number, number, keyof CellRange, number][] = [];
    if (r.top > 0) ring.push([r.top - 1, -1, 'top', r.top - 1]);
    if (r.bottom < MAX_ROW) ring.push([r.bottom + 1, -1, 'bottom', r.bottom + 1]);
    if (r.left > 0) ring.push([-1, r.left - 1, 'left', r.left - 1]);
    if (r.right < MAX_COL) ring.push([-1, r.right + 1, 'right', r.right + 1]);
    for (const [row, col, side, to] of ring) {
      const left = Math.max(0, r.left - 1);
      const right = Math.min(MAX_COL, r.right + 1);
      const top = Math.max(0, r.top - 1);
      const bottom = Math.min(MAX_ROW, r.bottom + 1);
      let hit = false;
      if (row >= 0) for (let c = left; c <= right && !hit; c++) hit = isFilled(row, c);
      else for (let q = top; q <= bottom && !hit; q++) hit = isFilled(q, col);
      if (hit) {
        r = { ...r, [side]: to };
        grew = true;
        any = true;
      }
    }
  }
  return any ? r : null;
}
