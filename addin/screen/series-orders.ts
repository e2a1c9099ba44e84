/**
 * Which pairs a screen ranks. Engle-Granger's residual test asks whether two wandering series
 * share one long-run path (Engle & Granger 1987): it needs two series integrated of the same
 * order, at least 1. A series that settles around its own mean (order 0) "cointegrates" with
 * anything through a slope near zero, so its pairs would top the ranking without saying
 * anything about a shared path; a pair of different orders cannot share one.
 *
 * Each series' order is decided once, by the same routine and settings the pairwise report
 * uses (integrationOrder: ADF from the second differences down, KPSS as a check), at the
 * screen's level and with the report's default deterministic terms (a constant). Pairs whose
 * two members do not share an order of 1 or more are set aside with a reason in words, and are
 * not part of the multiple-testing family.
 */
import { isMooringInputError } from '../errors';
import type { Deterministic } from '../result';
import { orderNumber, orderText } from '../report/series-section';
import { integrationOrder } from '../unitroot/integration-order';
import type { ScreenSettings } from './screen-options';
import type { ScreenUniverse } from './screen-universe';

/** Deterministic terms of the order tests: the pairwise report's default (report/check-input.ts). */
export const ORDER_DETERMINISTIC: Deterministic = 'const';

/** One series' order of integration, as the screen decided it. */
export interface SeriesOrder {
  name: string;
  /** 0, 1, 2, or 3 for "above 2"; null when it could not be decided (see note). */
  order: number | null;
  /** "I(0)", "I(1)", "I(2)", "above I(2)"; null when undecided. */
  orderText: string | null;
  /** Whether KPSS tells the same story as ADF at that order; null when undecided. */
  agree: boolean | null;
  /** Why the order could not be decided (null when it was). */
  note: string | null;
}

/** A directed pair the screen did not rank, and why. */
export interface SetAsidePair {
  y: string;
  x: string;
  orderY: number | null;
  orderX: number | null;
  reason: string;
}

/** The values of series j with its gaps left out, in row order. */
function valuesOf(universe: ScreenUniverse, j: number): Float64Array {
  const { rows, data } = universe;
  const column = data.subarray(j * rows, (j + 1) * rows);
  if (universe.complete[j] === 1) return column;
  return column.filter((v) => v === v);
}

/** True when the values do not move: the relative rule of the pair screen (pair-relation.ts) and the series cleaner. */
function doesNotMove(values: Float64Array): boolean {
  const n = values.length;
  if (n === 0) return true;
  let mean = 0;
  for (let t = 0; t < n; t++) mean += values[t];
  mean /= n;
  let ss = 0;
  for (let t = 0; t < n; t++) ss += (values[t] - mean) * (values[t] - mean);
  return !(Math.sqrt(ss / n) > 1e-10 * Math.max(Math.abs(mean), 1e-300));
}

/** Each series' order of integration (see the file comment); a series the routine refuses gets a null order and the reason. */
export function seriesOrders(universe: ScreenUniverse, settings: Pick<ScreenSettings, 'alpha'>): SeriesOrder[] {
  return universe.names.map((_, j) => seriesOrder(universe, settings, j));
}

/** The order of series j alone (seriesOrders is this for every j; threads share the series out by it). */
export function seriesOrder(universe: ScreenUniverse, settings: Pick<ScreenSettings, 'alpha'>, j: number): SeriesOrder {
  const name = universe.names[j];
  const values = valuesOf(universe, j);
  if (doesNotMove(values)) return { name, order: null, orderText: null, agree: null, note: `${name} does not move` };
  try {
    const result = integrationOrder(values, { alpha: settings.alpha, deterministic: ORDER_DETERMINISTIC }, name);
    const order = orderNumber(result.order);
    return { name, order, orderText: orderText(order), agree: result.agree, note: null };
  } catch (e) {
    if (!isMooringInputError(e)) throw e;
    return { name, order: null, orderText: null, agree: null, note: e.message.replace(/\.$/, '') };
  }
}

/** The universe with each series' order attached, for the chunk function to skip the pairs it sets aside. */
export function withSeriesOrders(universe: ScreenUniverse, settings: Pick<ScreenSettings, 'alpha'>): ScreenUniverse {
  return { ...universe, orders: seriesOrders(universe, settings) };
}

/** True when two series may be ranked as a pair: both orders decided, equal, and at least 1. */
export function canPair(a: SeriesOrder, b: SeriesOrder): boolean {
  return a.order !== null && a.order >= 1 && a.order === b.order;
}

/** "order 1", "order above 2". */
function orderWords(order: number): string {
  return order > 2 ? 'order above 2' : `order ${order}`;
}

/** What keeps one series out of every pair, or null when it can pair with a series of its own order. */
export function loneReason(s: SeriesOrder): string | null {
  if (s.order === null) return `the order of integration of ${s.name} could not be decided (${s.note})`;
  if (s.order === 0) return `${s.name} settles around its own mean (order 0)`;
  return null;
}

/** The reason a pair is set aside, in plain words: "TankPremium settles around its own mean (order 0): a pair needs ...". */
export function setAsideReason(y: SeriesOrder, x: SeriesOrder): string {
  const lone = [y, x].map(loneReason).filter((r): r is string => r !== null);
  const why = lone.length > 0
    ? lone.join(', and ')
    : `${y.name} wanders with ${orderWords(y.order as number)} and ${x.name} with ${orderWords(x.order as number)}`;
  return `${why}: a pair needs two wandering series of the same order`;
}

/**
 * The set-aside directed pairs, in the order of the screen's records ((i, j) then (j, i) for
 * each unordered pair i < j), at most `limit` of them: they follow from the orders alone.
 */
export function setAsidePairs(orders: readonly SeriesOrder[], limit = Number.POSITIVE_INFINITY): SetAsidePair[] {
  const out: SetAsidePair[] = [];
  const N = orders.length;
  for (let i = 0; i < N && out.length < limit; i++) {
    for (let j = i + 1; j < N && out.length < limit; j++) {
      if (canPair(orders[i], orders[j])) continue;
      for (const [y, x] of [[orders[i], orders[j]], [orders[j], orders[i]]]) {
        if (out.length < limit) out.push({ y: y.name, x: x.name, orderY: y.order, orderX: x.order, reason: setAsideReason(y, x) });
      }
    }
  }
  return out;
}

/**
 * The set-aside pairs in a few lines, grouped: one line per series that pairs with nothing
 * (order 0 or undecided: all 2 (N - 1) of its directed pairs), then one per combination of two
 * different orders of 1 or more (2 n_a n_b directed pairs), in the order the records first meet it.
 */
export function setAsideSummary(orders: readonly SeriesOrder[]): string[] {
  const lines: string[] = [];
  const N = orders.length;
  for (const s of orders) {
    const lone = loneReason(s);
    if (lone !== null && N > 1) lines.push(`${lone}: its ${2 * (N - 1)} directed pairs set aside`);
  }
  const alone = orders.map((s) => loneReason(s) !== null);
  const wandering = new Map<number, number>();
  orders.forEach((s, i) => {
    if (!alone[i]) wandering.set(s.order as number, (wandering.get(s.order as number) ?? 0) + 1);
  });
  // Each combination of two orders in the order the records first meet it (orders are 1..3).
  const met = new Set<number>();
  const mixed = new Map<string, number>();
  for (let i = 0; i < N; i++) {
    if (alone[i]) continue;
    for (let j = i + 1; j < N; j++) {
      if (alone[j] || orders[i].order === orders[j].order) continue;
      const [low, high] = [orders[i].order as number, orders[j].order as number].sort((u, v) => u - v);
      if (met.has(10 * low + high)) continue;
      met.add(10 * low + high);
      mixed.set(`a series of ${orderWords(low)} with one of ${orderWords(high)}`, 2 * (wandering.get(low) as number) * (wandering.get(high) as number));
    }
  }
  for (const [key, count] of mixed) lines.push(`${key}: ${count} directed pair${count === 1 ? '' : 's'} set aside`);
  return lines;
}
