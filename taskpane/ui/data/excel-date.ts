/**
 * Dates as the pane shows and passes them: ISO text (2024-03-15). A date cell arrives from
 * the workbook either as text or as Excel's serial number (days since 1899-12-30 in the 1900
 * date system, whose day 60 is the phantom 29 February 1900; serials from 61 on map exactly).
 */
import type { CellContent } from '../../workbook/port';

/** Day 0 of Excel's 1900 date system, as a Unix time in milliseconds (1899-12-30). */
const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);
const DAY_MS = 86_400_000;

/** The ISO date (with time when it has one) of an Excel serial number. */
export function excelSerialToIso(serial: number): string {
  const ms = EXCEL_EPOCH_MS + Math.round(serial * DAY_MS);
  const iso = new Date(ms).toISOString();
  return Number.isInteger(serial) ? iso.slice(0, 10) : iso.slice(0, 16).replace('T', ' ');
}

/** A date cell as text: ISO for serial numbers, trimmed text as given, null when blank. */
export function dateCellText(cell: CellContent): string | null {
  if (cell === null || cell === '') return null;
  if (typeof cell === 'number') return Number.isFinite(cell) && cell > 0 ? excelSerialToIso(cell) : null;
  if (typeof cell === 'string') return cell.trim() === '' ? null : cell.trim();
  return null;
}

/** Unix seconds of an ISO date text (for chart axes), or null when it does not read as a date. */
export function isoToUnixSeconds(text: string | null): number | null {
  if (text === null) return null;
  const m = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2}))?/.exec(text);
  if (!m) return null;
  const ms = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), Number(m[4] ?? 0), Number(m[5] ?? 0));
  return Number.isFinite(ms) ? ms / 1000 : null;
}
