import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { benjaminiHochberg } from '../../addin/screen/benjamini-hochberg';
import { chanceSentence, expectedByChance, groupedNumber } from '../../addin/screen/chance-sentence';

/**
 * The procedure is Benjamini & Hochberg (1995), sec. 3: with m sorted p-values, reject the k
 * smallest for the largest k with p_(k) <= k q / m. Adjusted p-values q_(i) = min over j >= i
 * of min(1, m p_(j) / j) reject exactly those at q.
 *
 * The 15 p-values are those of the worked example in Benjamini & Hochberg (1995), sec. 4.1
 * (from memory), where the procedure at q = 0.05 rejects four hypotheses. Worked by hand here:
 * m = 15, so k q / m = k / 300:
 *   k:        1      2      3      4      5      6      7      8      9
 *   p_(k):  .0001  .0004  .0019  .0095  .0201  .0278  .0298  .0344  .0459
 *   k/300:  .0033  .0067  .0100  .0133  .0167  .0200  .0233  .0267  .0300
 * p_(4) = .0095 <= .0133 and every later p_(k) is above k/300, so k = 4: four rejections.
 * Adjusted, 15 p_(j) / j from the top, then the running minimum downwards:
 *   j = 15: 15 x 1.0000 / 15 = 1            j = 9: 15 x .0459 / 9 = .0765
 *   j = 14: 15 x .7590 / 14 = .81321        j = 8: 15 x .0344 / 8 = .0645
 *   j = 13: 15 x .6528 / 13 = .75323        j = 7: 15 x .0298 / 7 = .063857
 *   j = 12: 15 x .5719 / 12 = .714875       j = 6: 15 x .0278 / 6 = .0695 -> min .063857
 *   j = 11: 15 x .4262 / 11 = .58118        j = 5: 15 x .0201 / 5 = .0603
 *   j = 10: 15 x .3240 / 10 = .486          j = 4: 15 x .0095 / 4 = .035625
 *   j = 3: .0095, j = 2: .003, j = 1: .0015.
 */
const P = [0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1.0];
const HAND = [0.0015, 0.003, 0.0095, 0.035625, 0.0603, 15 * 0.0298 / 7, 15 * 0.0298 / 7, 0.0645, 0.0765, 0.486, 15 * 0.4262 / 11, 15 * 0.5719 / 12, 15 * 0.6528 / 13, 15 * 0.759 / 14, 1];

describe('Benjamini-Hochberg adjusted p-values (Benjamini & Hochberg 1995)', () => {
  it('match the hand-worked adjustment of the 15 p-values of the 1995 example (to 1e-12)', () => {
    const q = benjaminiHochberg(P);
    HAND.forEach((v, i) => expect(q[i]).toBeCloseTo(v, 12));
  });

  it('reject four at q = 0.05, as in the 1995 example', () => {
    expect(Array.from(benjaminiHochberg(P)).filter((v) => v <= 0.05)).toHaveLength(4);
  });

  it('keep the input order: the same values shuffled give the same adjustment per value', () => {
    const order = [14, 3, 9, 0, 7, 12, 1, 5, 10, 2, 8, 13, 4, 11, 6];
    const q = benjaminiHochberg(order.map((i) => P[i]));
    order.forEach((i, k) => expect(q[k]).toBeCloseTo(HAND[i], 12));
  });

  it('give tied p-values one adjusted value (hand-checked: m = 4, p = .01, .02, .02, .04 -> .02667, .02667, .02667, .04)', () => {
    // By hand: j = 4: 4 x .04 / 4 = .04; j = 3: 4 x .02 / 3 = .026667; j = 2: 4 x .02 / 2 = .04 -> running
    // minimum .026667; j = 1: 4 x .01 / 1 = .04 -> .026667. Both ties get .026667, and so does .01.
    const q = benjaminiHochberg([0.01, 0.02, 0.02, 0.04]);
    expect(Array.from(q)).toEqual([0.08 / 3, 0.08 / 3, 0.08 / 3, 0.04]);
  });

  it('never lower a p-value and never exceed 1', () => {
    const q = benjaminiHochberg([0.9, 0.5, 0.99, 0.2]);
    [0.9, 0.5, 0.99, 0.2].forEach((p, i) => {
      expect(q[i]).toBeGreaterThanOrEqual(p);
      expect(q[i]).toBeLessThanOrEqual(1);
    });
  });

  it('refuse a p-value outside [0, 1] or not a number with MooringInputError', () => {
    expect(() => benjaminiHochberg([0.1, 1.2])).toThrow(MooringInputError);
    expect(() => benjaminiHochberg([Number.NaN])).toThrow(/p-value 1 is NaN/);
    expect(benjaminiHochberg([])).toHaveLength(0);
  });
});

describe('the chance sentence', () => {
  it('states how many of the tested pairs chance alone would pass at the level', () => {
    expect(expectedByChance(2450, 0.05)).toBe(123); // 2,450 x 0.05 = 122.5, rounded
    expect(chanceSentence({ tested: 2450, alpha: 0.05, rawPasses: 140, discoveries: 9 })).toBe(
      'Of 2,450 directed pairs tested at 5%, 140 pass on their own p-value, but about 123 would pass by chance alone even if no pair were related; ' +
        '9 pass after false-discovery-rate adjustment (Benjamini-Hochberg over all 2,450 directed pairs).',
    );
  });

  it('uses the chosen level and singular words for one pair', () => {
    const s = chanceSentence({ tested: 9900, alpha: 0.01, rawPasses: 1, discoveries: 1 });
    expect(s).toContain('Of 9,900 directed pairs tested at 1%, 1 passes on its own p-value, but about 99 would pass by chance alone');
    expect(s).toContain('1 passes after false-discovery-rate adjustment');
  });

  it('says so when nothing could be tested', () => {
    expect(chanceSentence({ tested: 0, alpha: 0.05, rawPasses: 0, discoveries: 0 })).toMatch(/^No pair could be tested at 5%/);
  });

  it('groups thousands', () => {
    expect(groupedNumber(1234567)).toBe('1,234,567');
    expect(groupedNumber(999)).toBe('999');
  });
});
