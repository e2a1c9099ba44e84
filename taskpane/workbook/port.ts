/**
 * The one narrow port through which the pane reaches the workbook. Two adapters implement it:
 * the Office.js adapter (office-adapter.ts, inside Excel) and the in-memory adapter
 * (memory-workbook.ts, for tests and the preview page). The pane's logic never touches
 * Office.js directly.
 *
 * Cells are addressed A1-style on a named sheet; a value is a number, a string, a boolean or
 * null (empty). A formula is a string starting with "=".
 */

/** One cell's content as the pane sees it. */
export type CellContent = number | string | boolean | null;

/** A rectangular block of cells, row-major. */
export type CellGrid = CellContent[][];

/** A detected data region: its address, a header row, optional date column, optional Excel table. */
export interface DataRegion {
  sheet: string;
  /** A1 address of the whole region including the header row, e.g. "B2:H781". */
  address: string;
  /** Header names, left to right. */
  headers: string[];
  /** Values below the header, row-major (numbers, text, blanks as null). */
  rows: CellGrid;
  /** Index into headers of a date column, or null. */
  dateColumn: number | null;
  /** The Excel table the region belongs to, if any (structured references use its name). */
  tableName: string | null;
  /** Sheet row number of the first data row (the row after the header). */
  firstDataRow: number;
}

/** How a cell in a written block should look. */
export interface CellFormat {
  numberFormat?: string;
  bold?: boolean;
  italic?: boolean;
  /** Fill colour as #rrggbb. Never the only carrier of meaning: verdict cells also hold text. */
  fill?: string;
  fontColor?: string;
  /** Heading level, for section titles (1 = block title). */
  heading?: 1 | 2;
  wrap?: boolean;
  /**
   * Fills that follow the cell's text as it changes (conditional formatting): the first rule
   * whose text the cell's shown text begins with gives the fill. Optional; added after the
   * first version of the port, so adapters that ignore it still write a correct block.
   */
  textFills?: { startsWith: string; fill: string }[];
}

/** One cell of a block to write: a value or a formula, with an optional format. */
export interface BlockCell {
  value?: CellContent;
  formula?: string;
  format?: CellFormat;
}

/** A block of cells to write, anchored at its top-left cell. */
export interface BlockToWrite {
  sheet: string;
  /** Top-left cell, e.g. "J2". */
  anchor: string;
  cells: BlockCell[][];
  /** Workbook-level name to create over the block so the pane can find, refresh or remove it. */
  name: string;
  /** Column widths in points, left to right (optional). */
  columnWidths?: number[];
  /**
   * A1 ranges on the block's sheet, outside `cells`, that the block's formulas spill into
   * (a column of the spread below its formula). occupiedCells checks them too, and writeBlock
   * clears them, because a spill blocked by a filled cell shows #SPILL!. Optional.
   */
  reserved?: string[];
  /** Text kept with the workbook-level name (its comment), returned by findBlock: where the block came from. Optional. */
  note?: string;
}

/** A block found by its workbook-level name. */
export interface FoundBlock {
  sheet: string;
  address: string;
  /** The note written with the block, or null when it has none. */
  note?: string | null;
}

/** A native line chart over ranges of a written block. */
export interface ChartToAdd {
  sheet: string;
  title: string;
  /** A1 address of the x values (dates or row numbers). */
  categories: string;
  /** One address per line, with its legend name. */
  series: { name: string; values: string }[];
  /** Top-left cell where the chart is placed. */
  anchor: string;
  /** Name of the chart, to find it again. */
  name: string;
}

/** What would be overwritten by a write: the non-empty cells already there. */
export interface OccupiedCell {
  address: string;
  value: CellContent;
  formula?: string;
}

/** The result of a write: all or nothing, or exactly what was written before a failure. */
export interface WriteOutcome {
  ok: boolean;
  /** Addresses written (the whole block when ok). */
  written: string[];
  /** When not ok: what went wrong, in words, and whether the sheet was restored. */
  error?: string;
  restored?: boolean;
}

/** A change notice: rows were added to (or changed in) a watched region or table. */
export interface RegionChange {
  sheet: string;
  address: string;
  /** New row count below the header. */
  rowCount: number;
}

export interface WorkbookPort {
  /** The region (table or current region) around the user's selection, or null when the selection is empty. */
  regionAroundSelection(): Promise<DataRegion | null>;
  /** Reads a region by sheet and A1 address (header row first). */
  readRegion(sheet: string, address: string): Promise<DataRegion>;
  /**
   * Reads an Excel table by name, at its current size (header row first). Optional: added
   * after the first version of the port; callers fall back to readRegion when it is absent.
   */
  readTable?(name: string): Promise<DataRegion>;
  /** Turns a plain range into an Excel table so pasted rows are included; returns the table's name. */
  makeTable(sheet: string, address: string, suggestedName: string): Promise<string>;
  /** Lists the non-empty cells a block would overwrite (empty list: safe to write). */
  occupiedCells(block: BlockToWrite): Promise<OccupiedCell[]>;
  /** Writes the block in one batched operation; on failure restores what it can and says exactly what happened. */
  writeBlock(block: BlockToWrite): Promise<WriteOutcome>;
  /** Adds a native line chart. */
  addChart(chart: ChartToAdd): Promise<void>;
  /** Finds a block previously written under this workbook-level name (its sheet and address), or null. */
  findBlock(name: string): Promise<FoundBlock | null>;
  /** Clears a block (and its chart, by the same name) and removes its name. */
  removeBlock(name: string): Promise<void>;
  /** Adds a sheet with a unique name based on the suggestion; returns the name used. */
  addSheet(suggestedName: string): Promise<string>;
  /** Calls back when the watched region or table changes; returns a function that stops watching. */
  watch(sheet: string, address: string, onChange: (change: RegionChange) => void): Promise<() => void>;
}
