/**
 * Benchmark of the series cleaner on what a whole-column reference delivers: a
 * 1,048,576-cell column holding 2,500 numbers and then blanks (target: within 20 ms).
 */
import { cleanSeries } from '../series/clean-series';
import { timeIt, type Timing } from './timing';

export function benchCleaner(): Timing[] {
  const column: unknown[] = new Array(1_048_576).fill('');
  for (let i = 0; i < 2500; i++) column[i] = 100 + Math.sin(i / 10) * 5 + i * 0.01;
  const used = column.slice(0, 2500);
  return [
    timeIt('Cleaner, whole column: 1,048,576 cells, 2,500 numbers then blanks', () => cleanSeries(column, { name: 'Crude' }), { targetMs: 20 }),
    timeIt('Cleaner, used range only: 2,500 numbers', () => cleanSeries(used, { name: 'Crude' })),
  ];
}
