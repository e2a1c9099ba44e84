/**
 * Running co-moments over a range of rows that moves forward (running-comoments.ts), fed by a
 * function that gives the values of row t. Moving from [from, to] to [from', to'] removes the
 * rows that left and adds the rows that came, so a rolling analysis costs O(step) per window
 * instead of O(window). After a window's worth of removals the sums are rebuilt from the rows
 * (O(window), so O(1) per row in all), which bounds the rounding that add-and-remove gathers;
 * and they are rebuilt at once when removals cancelled too many digits (a far-out row leaving
 * the window: RunningComoments.lostDigits), so every window's co-moments are those of a fresh
 * pass over its rows to within a few thousand units in the last place, whatever left before it.
 */
import { RunningComoments } from './running-comoments';

/** Co-moments of the rows from .. to, moved forward by moveTo (see the file comment). */
export class SlidingComoments {
  readonly moments: RunningComoments;
  private from = 0;
  private to = -1;
  private removedSinceRebuild = 0;
  private readonly row: Float64Array;

  constructor(k: number, private readonly valuesAt: (t: number, out: Float64Array) => void) {
    this.moments = new RunningComoments(k);
    this.row = new Float64Array(k);
  }

  /** Makes the range rows from .. to (inclusive; from never moves back). */
  moveTo(from: number, to: number): void {
    const overlap = from <= this.to && this.moments.count > 0;
    const removing = overlap ? from - this.from : 0;
    if (!overlap || this.removedSinceRebuild + removing > this.to - this.from + 1) {
      this.rebuild(from, to);
    } else {
      for (let t = this.from; t < from; t++) {
        this.valuesAt(t, this.row);
        this.moments.remove(this.row);
      }
      for (let t = this.to + 1; t <= to; t++) this.addRow(t);
      this.removedSinceRebuild += removing;
      if (this.moments.lostDigits()) this.rebuild(from, to);
    }
    this.from = from;
    this.to = to;
  }

  private rebuild(from: number, to: number): void {
    this.moments.clear();
    for (let t = from; t <= to; t++) this.addRow(t);
    this.removedSinceRebuild = 0;
  }

  private addRow(t: number): void {
    this.valuesAt(t, this.row);
    this.moments.add(this.row);
  }
}
