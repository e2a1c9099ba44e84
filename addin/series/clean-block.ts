/**
 * Cleans several series at once (the columns of a block, for Johansen or a screen) and lines
 * them up by row, so every returned series has the same length and the same source rows.
 */
import { MooringInputError } from '../errors';
import { alignAll } from './align-series';
import { cleanSeries, type CleanOptions, type CleanSeries } from './clean-series';

/** Options for a block: the cleaner's options, applied to every column (names come separately). */
export type BlockOptions = Omit<CleanOptions, 'name'>;

/**
 * Cleans each column with its name, then aligns them all by row (see alignAll). Names default
 * to "series 1", "series 2", ... where fewer names than columns are given.
 */
export function cleanBlock(columns: readonly (readonly unknown[])[], names: readonly string[] = [], options: BlockOptions = {}): CleanSeries[] {
  if (!Array.isArray(columns) || columns.length === 0) {
    throw new MooringInputError('The block holds no columns: select a range with one column per series.');
  }
  if (names.length > columns.length) {
    throw new MooringInputError(`${names.length} names were given for ${columns.length} column${columns.length === 1 ? '' : 's'}: give one name per column.`);
  }
  const cleaned = columns.map((cells, j) => cleanSeries(cells, { ...options, name: names[j] ?? `series ${j + 1}` }));
  return alignAll(cleaned, { minLength: options.minLength, skipGapsWords: options.skipGapsWords });
}
