/** A plain text table for the diagnostic: chosen columns left-aligned (words), the rest right-aligned (numbers). */

/** Lines of a table with a header row; every column as wide as its widest cell; `textColumns` are left-aligned. */
export function textTable(header: readonly string[], rows: readonly (readonly string[])[], textColumns: readonly number[] = [0], indent = 2): string[] {
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)));
  const line = (cells: readonly string[]): string =>
    `${' '.repeat(indent)}${cells.map((c, j) => (textColumns.includes(j) ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  ')}`.trimEnd();
  return [line(header), ...rows.map(line)];
}
