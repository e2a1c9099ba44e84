/**
 * Where a block lies on its sheet, shared by both adapters: the rectangle its cells cover
 * from the anchor, the spill ranges it reserves, and unique names for tables, sheets and
 * blocks (letters, digits, underscores and dots only, starting with a letter, so Excel takes
 * them as names and never as cell addresses).
 */
import { MooringInputError } from '../../addin/errors';
import { parseCell, parseRange, type CellRange } from './a1-address';
import type { BlockToWrite } from './port';

/** The rectangle of the block's cells (rows as given, width of its widest row). */
export function blockRange(block: BlockToWrite): CellRange {
  let at;
  try {
    at = parseCell(block.anchor);
  } catch {
    throw new MooringInputError(`The block's top-left cell '${block.anchor}' is not a cell address such as J2.`, block.anchor);
  }
  const rows = Math.max(1, block.cells.length);
  const cols = Math.max(1, ...block.cells.map((r) => r.length));
  return { top: at.row, left: at.col, bottom: at.row + rows - 1, right: at.col + cols - 1 };
}

/** The spill ranges the block reserves, parsed. */
export function reservedRanges(block: BlockToWrite): CellRange[] {
  return (block.reserved ?? []).map((a) => {
    try {
      return parseRange(a);
    } catch {
      throw new MooringInputError(`The block reserves '${a}', which is not a range such as M3:M782.`, a);
    }
  });
}

/** A name Excel accepts, from any text: other characters become _, and it never starts with a digit or looks like a cell. */
export function safeName(text: string, fallback: string): string {
  let s = text.replace(/[^A-Za-z0-9_.]/g, '_').replace(/_+/g, '_').replace(/^[_.]+|[_.]+$/g, '');
  if (s === '' ) s = fallback;
  if (!/^[A-Za-z_]/.test(s) || /^[A-Za-z]{1,3}\d+$/.test(s) || /^[RrCc]$/.test(s)) s = `${fallback}_${s}`;
  return s.slice(0, 200);
}

/** `suggested` made safe, with 2, 3, ... added until `taken` says no; at most `maxLength` characters. */
export function uniqueName(suggested: string, fallback: string, taken: (name: string) => boolean, maxLength = 200): string {
  const base = safeName(suggested, fallback).slice(0, maxLength);
  if (!taken(base)) return base;
  for (let k = 2; ; k++) {
    const tail = `_${k}`;
    const name = base.slice(0, maxLength - tail.length) + tail;
    if (!taken(name)) return name;
  }
}
