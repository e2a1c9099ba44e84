/**
 * The screen's answer gathered pair by pair, in memory that does not grow with the pairs'
 * objects: records arrive in the order of the unordered pairs (a chunk, a batch of threads'
 * chunks, or a part file read back), and the tally keeps only
 *   - the p-value of every directed pair tested (one number each: the false-discovery
 *     adjustment needs the whole family),
 *   - the best `keep` pairs by evidence among those within the half-life range (the order of
 *     screen-ranking.ts), as records, decoded only at the end,
 *   - counts, and the first `untestedLimit` untested pairs with their reasons.
 * Set-aside pairs follow from the series' orders alone (series-orders.ts) and are counted,
 * never stored. The answer is the same whatever the batches, threads or parts the records
 * came in: each record depends only on its two series and the settings, and the tally reads
 * them in one fixed order.
 */
import { FalseDiscoveryAdjustment } from './benjamini-hochberg';
import { chanceSentence, expectedByChance } from './chance-sentence';
import { FIELD, PAIR_STATUS, RECORD_SIZE, isTested, untestedReason } from './pair-record';
import { decodePair, type ScreenPair } from './screen-ranking';
import type { ScreenSettings } from './screen-options';
import { unorderedPairAt, unorderedPairCount, type ScreenUniverse } from './screen-universe';
import { ORDER_DETERMINISTIC, setAsideSummary, type SeriesOrder } from './series-orders';
import { levelText } from '../cointegration/wording';

/** A directed pair that was not tested, and why. */
export interface UntestedPair {
  y: string;
  x: string;
  reason: string;
}

/** Everything a screen reports, with the ranked pairs cut to what was asked for. */
export interface ScreenSummary {
  /** The best tested directed pairs within the half-life range, ranked by evidence (at most the number kept). */
  pairs: ScreenPair[];
  /** Tested directed pairs within the half-life range, whether kept in `pairs` or not. */
  ranked: number;
  /** Each series' order of integration, in the order of `names`. */
  orders: SeriesOrder[];
  /** How the orders were decided: the screen's level and the report's default deterministic terms. */
  orderTests: { alpha: number; deterministic: string; description: string };
  /** Directed pairs not ranked because their series do not share an order of 1 or more. */
  setAsideCount: number;
  /** The set-aside pairs in a few grouped lines (empty when none was set aside). */
  setAsideSummary: string[];
  names: string[];
  alpha: number;
  /** The multiple-testing family, in words and size. */
  family: { size: number; description: string };
  /** Pairs whose own p-value is at or below alpha. */
  rawPasses: number;
  /** tested x alpha: passes expected if no pair were related. */
  expectedByChance: number;
  /** Pairs whose adjusted p-value is at or below alpha (before the half-life range). */
  discoveries: number;
  chanceSentence: string;
  /** Untested directed pairs (the first ones, up to the limit the tally was given). */
  untested: UntestedPair[];
  /** Untested directed pairs in all. */
  untestedCount: number;
  settings: ScreenSettings;
  /** Sentences a reader should keep in mind. */
  cautions: string[];
}

/** Dependence caution: what Benjamini-Hochberg assumes and how far a pair screen meets it. */
export const DEPENDENCE_CAUTION =
  'The two directions of a pair use the same data, and pairs that share a series are related: Benjamini-Hochberg controls the false-discovery rate ' +
  'for independent or positively dependent tests (Benjamini & Yekutieli 2001), which a pair screen meets only approximately.';

/** A pair that passes a screen is a candidate: it still needs a look at its spread, a check out of sample, and a test for a break. */
export const CANDIDATE_CAUTION =
  'A pair that passes is a candidate to examine, not a trade: look at its spread, check it on rows the screen did not see, and test it for a break.';

/** A record kept for the ranking: its series and a copy of its numbers. */
interface KeptPair {
  yi: number;
  xi: number;
  record: Float64Array;
}

/** The tau a ranking compares: an exact fit (no finite tau) ranks as minus infinity. */
function rankTau(record: Float64Array): number {
  const tau = record[FIELD.tau];
  return Number.isFinite(tau) ? tau : Number.NEGATIVE_INFINITY;
}

/** The order of screen-ranking.ts on kept records: p-value, then tau, then the series' places. */
function byEvidence(a: KeptPair, b: KeptPair): number {
  const ta = rankTau(a.record);
  const tb = rankTau(b.record);
  return a.record[FIELD.pValue] - b.record[FIELD.pValue] || (ta === tb ? 0 : ta < tb ? -1 : 1) || a.yi - b.yi || a.xi - b.xi;
}

/** True when a half-life lies in the settings' range (none fails any bound), as withinHalfLifeRange. */
export function halfLifeInRange(halfLife: number, settings: ScreenSettings): boolean {
  if (settings.minHalfLife === null && settings.maxHalfLife === null) return true;
  if (!Number.isFinite(halfLife)) return false;
  if (settings.minHalfLife !== null && halfLife < settings.minHalfLife) return false;
  return settings.maxHalfLife === null || halfLife <= settings.maxHalfLife;
}

/** Gathers the records of every unordered pair, in order (see the file comment). */
export class ScreenTally {
  private next = 0;
  private readonly total: number;
  private pValues: Float64Array = new Float64Array(1024);
  private tested = 0;
  private inRangePValues: Float64Array | null;
  private inRange = 0;
  private rawPasses = 0;
  private exact = 0;
  private setAside = 0;
  private untestedCount = 0;
  private readonly untested: UntestedPair[] = [];
  private kept: KeptPair[] = [];
  private readonly orders: SeriesOrder[];

  /**
   * `keep`: how many ranked pairs to keep (Infinity: all); `untestedLimit`: how many untested
   * pairs to list with their reasons (all are counted).
   */
  constructor(
    private readonly universe: ScreenUniverse, private readonly settings: ScreenSettings,
    private readonly keep = Number.POSITIVE_INFINITY, private readonly untestedLimit = Number.POSITIVE_INFINITY,
  ) {
    if (!universe.orders) throw new RangeError('The screen universe carries no orders of integration: decide them with withSeriesOrders first.');
    this.orders = universe.orders;
    this.total = unorderedPairCount(universe.names.length);
    const ranged = settings.minHalfLife !== null || settings.maxHalfLife !== null;
    this.inRangePValues = ranged ? new Float64Array(1024) : null;
  }

  /** Unordered pairs taken so far (the next one expected). */
  get pairsTaken(): number {
    return this.next;
  }

  /** Takes the records of unordered pairs first, first + 1, ... (2 directed records each); `first` must be the next pair expected. */
  add(first: number, records: Float64Array): void {
    const count = records.length / (2 * RECORD_SIZE);
    if (first !== this.next || !Number.isInteger(count) || first + count > this.total) {
      throw new RangeError(`Records for unordered pairs ${first}..${first + count - 1} arrived; pair ${this.next} was expected next (of ${this.total}).`);
    }
    const N = this.universe.names.length;
    let [i, j] = count > 0 ? unorderedPairAt(first, N) : [0, 1];
    for (let k = 0; k < count; k++) {
      this.take(records, 2 * k, i, j);
      this.take(records, 2 * k + 1, j, i);
      j++;
      if (j === N) {
        i++;
        j = i + 1;
      }
    }
    this.next += count;
  }

  private take(records: Float64Array, r: number, yi: number, xi: number): void {
    const base = r * RECORD_SIZE;
    const status = records[base + FIELD.status];
    if (status === PAIR_STATUS.setAside) {
      this.setAside++;
      return;
    }
    if (!isTested(status)) {
      this.untestedCount++;
      if (this.untested.length < this.untestedLimit) {
        const { names } = this.universe;
        this.untested.push({ y: names[yi], x: names[xi], reason: untestedReason(status, records[base + FIELD.nobs], this.settings.minObservations) });
      }
      return;
    }
    const p = records[base + FIELD.pValue];
    if (this.tested === this.pValues.length) this.pValues = grown(this.pValues);
    this.pValues[this.tested++] = p;
    if (p <= this.settings.alpha) this.rawPasses++;
    if (!Number.isFinite(records[base + FIELD.tau])) this.exact++;
    if (!halfLifeInRange(records[base + FIELD.halfLife], this.settings)) return;
    if (this.inRangePValues) {
      if (this.inRange === this.inRangePValues.length) this.inRangePValues = grown(this.inRangePValues);
      this.inRangePValues[this.inRange] = p;
    }
    this.inRange++;
    if (this.keep <= 0) return;
    this.kept.push({ yi, xi, record: Float64Array.from(records.subarray(base, base + RECORD_SIZE)) });
    if (this.kept.length >= 2 * this.keep) this.kept = this.kept.sort(byEvidence).slice(0, this.keep);
  }

  /** The answer, once every pair has been taken; also the adjustment, for callers that read more pairs. */
  finish(): { summary: ScreenSummary; adjustment: FalseDiscoveryAdjustment } {
    if (this.next !== this.total) throw new RangeError(`The screen has ${this.next} of its ${this.total} unordered pairs.`);
    const { names, scales } = this.universe;
    const { settings, orders } = this;
    const N = names.length;
    const directed = N * (N - 1);
    const tested = this.tested;
    const inRangePValues = this.inRangePValues?.slice(0, this.inRange) ?? null;
    const adjustment = new FalseDiscoveryAdjustment(this.pValues.subarray(0, tested), true);
    this.pValues = new Float64Array(0);
    const discoveries = adjustment.discoveries(settings.alpha);
    const kept = this.kept.sort(byEvidence).slice(0, Math.min(this.keep, this.kept.length));
    const pairs = kept.map((k) => decodePair(names, k.record, 0, k.yi, k.xi, adjustment.adjusted(k.record[FIELD.pValue]), settings, orders, scales));
    const cautions = [DEPENDENCE_CAUTION, CANDIDATE_CAUTION];
    const setAside = this.setAside;
    if (setAside > 0) {
      cautions.push(
        `${setAside} directed pair${setAside === 1 ? ' was' : 's were'} set aside (listed under setAside) and are not in the family: ` +
          'their two series do not wander with the same order. The orders come from unit-root tests, which can misjudge a series near the boundary, ' +
          'so a set-aside pair is not shown to be unrelated.',
      );
    }
    const untested = this.untestedCount;
    if (untested > 0) cautions.push(`${untested} directed pair${untested === 1 ? ' was' : 's were'} not tested (listed under untested) and are not in the family.`);
    if (inRangePValues) {
      let shown = 0;
      for (const p of inRangePValues) if (adjustment.adjusted(p) <= settings.alpha) shown++;
      cautions.push(
        `The half-life range keeps ${this.inRange} of the ${tested} tested pairs (${shown} of the ${discoveries} discoveries); ` +
          'it was applied after the adjustment, so the adjusted p-values still count every pair tested.',
      );
    }
    if (this.exact > 0) cautions.push(`${this.exact} directed pair${this.exact === 1 ? ' is' : 's are'} an exact fit (p = 0): one column is probably copied or computed from another.`);
    const summary: ScreenSummary = {
      pairs,
      ranked: this.inRange,
      orders: orders.map((o) => ({ ...o })),
      orderTests: {
        alpha: settings.alpha,
        deterministic: ORDER_DETERMINISTIC,
        description: `each series' order of integration by ADF from the second differences down, checked by KPSS, at ${levelText(settings.alpha)} with a constant (as in the pairwise report)`,
      },
      setAsideCount: setAside,
      setAsideSummary: setAsideSummary(orders),
      names: names.slice(),
      alpha: settings.alpha,
      family: {
        size: tested,
        description:
          `every directed pair tested (${tested} of the ${directed} ordered pairs of ${N} series: each pair both ways round` +
          `${setAside > 0 ? `; ${setAside} set aside because their series do not wander with the same order` : ''})`,
      },
      rawPasses: this.rawPasses,
      expectedByChance: expectedByChance(tested, settings.alpha),
      discoveries,
      chanceSentence: chanceSentence({ tested, alpha: settings.alpha, rawPasses: this.rawPasses, discoveries }),
      untested: this.untested.slice(),
      untestedCount: untested,
      settings,
      cautions,
    };
    return { summary, adjustment };
  }
}

/** The array with twice the room, its numbers kept. */
function grown(a: Float64Array): Float64Array {
  const b = new Float64Array(Math.max(1024, 2 * a.length));
  b.set(a);
  return b;
}
