/**
 * How a block's formulas point at the source data. In an Excel table a column is a
 * structured reference, Prices[GateGasoil], which grows with the table, so rows pasted below
 * are included; a plain range is a sheet-qualified absolute range, Prices!$C$2:$C$781, which
 * does not grow (the pane offers to turn it into a table). Column names are escaped as Excel
 * requires: ' before [ ] # and ', and a second pair of brackets when the name holds a space or
 * any other special character.
 */
import { MooringInputError } from '../../addin/errors';
import { parseRange, qualified, type CellRange } from '../workbook/a1-address';
import type { DataRegion } from '../workbook/port';

/** Characters that make Excel want Table[[name]] instead of Table[name]. */
const SPECIAL = /[\s,:.[\]#'"{}$^&*+=\-<>/!@%()~`|\\;?]/;

/** A column name as the inside of a structured reference's brackets. */
export function columnSpecifier(name: string): string {
  const escaped = name.replace(/['[\]#]/g, (ch) => `'${ch}`);
  return SPECIAL.test(name) ? `[${escaped}]` : escaped;
}

/** A text as a formula's string literal: in double quotes, a quote inside doubled. */
export function textLiteral(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

/** How a block's formulas point at the prices: the columns of a region, or the columns of a join of its calendars (joined-references.ts). */
export interface PriceReferences {
  readonly live: boolean;
  column(name: string): string;
  pair(a: string, b: string): string;
  dates(): string | null;
  readonly rowCount: number;
  describe(): string;
}

/** Points a block's formulas at the columns of one data region. */
export class SeriesReferences implements PriceReferences {
  private readonly range: CellRange;

  constructor(private readonly region: DataRegion) {
    this.range = parseRange(region.address);
  }

  /** Whether the references grow with the data (the region is an Excel table). */
  get live(): boolean {
    return this.region.tableName !== null;
  }

  /** Index of a named column; refuses a name the region does not hold. */
  index(name: string): number {
    const j = this.region.headers.indexOf(name);
    if (j < 0) {
      throw new MooringInputError(
        `The data at ${this.region.sheet}!${this.region.address} have no column headed '${name}': the headers are ${this.region.headers.map((h) => `'${h}'`).join(', ')}.`,
        `${this.region.sheet}!${this.region.address}`,
      );
    }
    return j;
  }

  /** The data rows of one column: Table[Name] or Sheet!$C$2:$C$781. */
  column(name: string): string {
    const j = this.index(name);
    if (this.region.tableName) return `${this.region.tableName}[${columnSpecifier(name)}]`;
    return qualified(this.region.sheet, this.dataColumns(j, j));
  }

  /** Two columns side by side, in either order, for a block function: one reference when adjacent, else HSTACK of the two. */
  pair(a: string, b: string): string {
    const i = this.index(a);
    const j = this.index(b);
    if (Math.abs(i - j) === 1) {
      const [first, last] = i < j ? [a, b] : [b, a];
      if (this.region.tableName) return `${this.region.tableName}[[${this.bare(first)}]:[${this.bare(last)}]]`;
      return qualified(this.region.sheet, this.dataColumns(Math.min(i, j), Math.max(i, j)));
    }
    return `HSTACK(${this.column(a)},${this.column(b)})`;
  }

  /** The data rows of the columns from index `from` to index `to`: Table[[A]:[B]] or Sheet!$A$2:$B$781. */
  span(from: number, to: number): string {
    if (this.region.tableName) return `${this.region.tableName}[[${this.bare(this.region.headers[from])}]:[${this.bare(this.region.headers[to])}]]`;
    return qualified(this.region.sheet, this.dataColumns(from, to));
  }

  /** The date column's data rows, or null when the region has none. */
  dates(): string | null {
    const d = this.region.dateColumn;
    return d === null ? null : this.column(this.region.headers[d]);
  }

  /** Rows of data below the header now. */
  get rowCount(): number {
    return this.region.rows.length;
  }

  /** How the block describes where its numbers come from. */
  describe(): string {
    return this.region.tableName
      ? `table ${this.region.tableName} on ${this.region.sheet} (rows added to the table are included)`
      : `${qualified(this.region.sheet, this.range, false)} (a fixed range: rows pasted below it are left out until it is made a table)`;
  }

  private bare(name: string): string {
    return name.replace(/['[\]#]/g, (ch) => `'${ch}`);
  }

  private dataColumns(from: number, to: number): CellRange {
    return { top: this.range.top + 1, bottom: this.range.bottom, left: this.range.left + from, right: this.range.left + to };
  }
}
