/**
 * How the preview's sheet shows a cell: the value under the number formats the results block
 * uses ("0.0000", "0%", "0.0 \"days\"", "yyyy-mm-dd"), general numbers to ten significant
 * digits, text as it is. Display only: the value itself is what the workbook holds.
 */
import { excelSerialToIso } from '../ui/data/excel-date';
import type { CellContent } from '../workbook/port';

const FIXED = /^0(?:\.(0+))?(%)?(?:\s*"([^"]*)")?$/;

/** The text a cell shows for its value and number format. */
export function shownText(value: CellContent, numberFormat?: string): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return value;
  if (!Number.isFinite(value)) return '#NUM!';
  if (numberFormat === 'yyyy-mm-dd') return value > 0 ? excelSerialToIso(Math.round(value)) : String(value);
  const fixed = numberFormat ? FIXED.exec(numberFormat) : null;
  if (fixed) {
    const decimals = fixed[1]?.length ?? 0;
    const percent = fixed[2] === '%';
    const text = (percent ? value * 100 : value).toFixed(decimals);
    return `${text}${percent ? '%' : ''}${fixed[3] !== undefined ? ` ${fixed[3]}` : ''}`;
  }
  if (Number.isInteger(value)) return String(value);
  return String(Number(value.toPrecision(10)));
}

/** Whether the value lines up to the right (numbers) rather than the left. */
export function alignsRight(value: CellContent): boolean {
  return typeof value === 'number';
}
