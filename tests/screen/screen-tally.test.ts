/**
 * The tally keeps the best pairs and one p-value per pair, and must give what the screen that
 * keeps every pair gives: the same first pairs, counts, sentence and cautions, whatever the
 * batches the records arrive in.
 */
import { describe, expect, it } from 'vitest';
import { RECORD_SIZE } from '../../addin/screen/pair-record';
import { screenChunk } from '../../addin/screen/screen-chunk';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { resolveScreenOptions } from '../../addin/screen/screen-options';
import { ScreenTally } from '../../addin/screen/screen-tally';
import { screenUniverse, unorderedPairCount } from '../../addin/screen/screen-universe';
import { withSeriesOrders } from '../../addin/screen/series-orders';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { generatedUniverse } from './generated-universe';

// Seed 19: 2 clusters of 3 and 6 walks, plus one settling AR(1) (coefficient 0.5), 200 rows.
const { series: generated } = generatedUniverse(19, { clusters: 2, perCluster: 3, walks: 6, T: 200 });
const series = [...generated, { name: 'settles', values: autoregressive1(new SeededRandom(19), 200, 0.5, 1).map((v) => 50 + v) }];

describe.each([
  ['no half-life range', {}],
  ['half-life at most 8 rows', { maxHalfLife: 8 }],
])('ScreenTally with %s', (_, options) => {
  const settings = resolveScreenOptions(options);
  const universe = withSeriesOrders(screenUniverse(series), settings);
  const total = unorderedPairCount(series.length);
  const records = screenChunk(universe, settings, 0, total);
  const full = screenPairs(series, options);

  it.each([1, 5, 13])('keeping %i pairs, fed in batches of 4 pairs: the best pairs and every count as the full screen', (keep) => {
    const tally = new ScreenTally(universe, settings, keep, 2);
    for (let first = 0; first < total; first += 4) {
      const end = Math.min(total, first + 4);
      tally.add(first, records.subarray(2 * first * RECORD_SIZE, 2 * end * RECORD_SIZE));
    }
    const { summary } = tally.finish();
    expect(summary.pairs).toEqual(full.pairs.slice(0, keep));
    expect(summary.ranked).toBe(full.pairs.length);
    expect(summary.setAsideCount).toBe(full.setAside.length);
    expect(summary.setAsideSummary).toEqual(full.setAsideSummary);
    for (const key of ['family', 'rawPasses', 'discoveries', 'chanceSentence', 'cautions', 'orders'] as const) expect(summary[key]).toEqual(full[key]);
  });

  it('refuses records out of order, and an answer before every pair has arrived', () => {
    const tally = new ScreenTally(universe, settings, 3);
    expect(() => tally.add(2, records.subarray(4 * RECORD_SIZE, 6 * RECORD_SIZE))).toThrow(/pair 0 was expected next/);
    tally.add(0, records.subarray(0, 2 * RECORD_SIZE));
    expect(() => tally.finish()).toThrow(/1 of its/);
  });
});
