/** A plain text table for the diagnostic: chosen columns left-aligned (words), the rest right-aligned (numbers). */
import { terminalText } from './terminal-text';

/** Width of a cell as the terminal will show it: a control character from the data shows as a visible escape (terminal-text.ts). */
function shownWidth(cell: string): number {
  return terminalText(cell).length;
}

/** Lines of a table with a header row; every column as wide as its widest cell; `textColumns` are left-aligned. */
export function textTable(header: readonly string[], rows: readonly (readonly string[])[], textColumns: readonly number[] = [0], indent = 2): string[] {
  const widths = header.map((h, j) => rows.reduce((w, r) => Math.max(w, shownWidth(r[j] ?? '')), shownWidth(h)));
  const pad = (c: string, j: number): string => {
    const room = ' '.repeat(Math.max(0, widths[j] - shownWidth(c)));
    return textColumns.includes(j) ? c + room : room + c;
  };
  const line = (cells: readonly string[]): string => `${' '.repeat(indent)}${cells.map(pad).join('  ')}`.trimEnd();
  return [line(header), ...rows.map(line)];
}
