/**
 * How a block's formulas point at prices joined on their dates: the block holds one
 * MOOR.COMMONDATES formula over the calendars of the source (nested for a third calendar), whose
 * spill is the shared dates and every joined price column; every other formula reads a column of
 * that spill with CHOOSECOLS(<cell>#, k). The spill's columns are the joined region's columns in
 * order (joined-region.ts builds the region by the same join), so the block's formulas read the
 * very rows the pane analysed.
 */
import { MooringInputError } from '../../addin/errors';
import type { JoinedRegion } from './joined-region';
import { SeriesReferences, type PriceReferences } from './series-reference';

/** Points a block's formulas at the columns of the join spilled from `joinCell`. */
export class JoinedReferences implements PriceReferences {
  private readonly source: SeriesReferences;

  /** `joinCell` is the absolute address of the cell holding the MOOR.COMMONDATES formula (such as $Q$3). */
  constructor(private readonly region: JoinedRegion, private readonly joinCell: string) {
    this.source = new SeriesReferences(region.join.source);
  }

  /** The MOOR.COMMONDATES formula that makes the join: each calendar's range, date column first. */
  joinFormula(): string {
    const ranges = this.region.join.calendars.map((c) => this.source.span(c.date, c.series[c.series.length - 1]));
    return `=${ranges.slice(1).reduce((inner, next) => `MOOR.COMMONDATES(${inner},${next})`, ranges[0])}`;
  }

  /** Columns of the spill: the shared dates, then every joined price column. */
  get heads(): string[] {
    return this.region.headers.slice();
  }

  get live(): boolean {
    return this.source.live;
  }

  private position(name: string): number {
    const j = this.region.headers.indexOf(name);
    if (j <= 0) {
      throw new MooringInputError(`The prices joined on their dates hold no column headed '${name}': they hold ${this.region.headers.slice(1).map((h) => `'${h}'`).join(', ')}.`);
    }
    return j + 1;
  }

  column(name: string): string {
    return `CHOOSECOLS(${this.joinCell}#,${this.position(name)})`;
  }

  /** Two joined columns side by side, in the order SeriesReferences gives them (sheet order when adjacent). */
  pair(a: string, b: string): string {
    const i = this.position(a);
    const j = this.position(b);
    const [first, last] = Math.abs(i - j) === 1 && j < i ? [j, i] : [i, j];
    return `CHOOSECOLS(${this.joinCell}#,${first},${last})`;
  }

  dates(): string {
    return `CHOOSECOLS(${this.joinCell}#,1)`;
  }

  get rowCount(): number {
    return this.region.rows.length;
  }

  describe(): string {
    return `${this.source.describe()}, joined on the dates every series shares by the MOOR.COMMONDATES formula in ${this.joinCell.replace(/\$/g, '')}`;
  }
}
