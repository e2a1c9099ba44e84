/** A plain text table for the relation commands: the first column left-aligned, the others right-aligned. */

/** Lines of a table with a header row; every column as wide as its widest cell. */
export function plainTable(header: readonly string[], rows: readonly (readonly string[])[]): string[] {
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => r[j].length)));
  const line = (cells: readonly string[]): string => `  ${cells.map((c, j) => (j === 0 ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  ')}`.trimEnd();
  return [line(header), ...rows.map(line)];
}
