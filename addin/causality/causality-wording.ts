/**
 * The sentences of the lead-lag tests: null hypotheses, alternatives, verdicts and cautions.
 * Kept apart from the arithmetic so every test words the same idea the same way.
 */

/** Names of the two series of one test direction: the one that may lead, and the one that may follow. */
export interface PairNames {
  cause: string;
  effect: string;
}

/** Names used when the caller gives none. */
export const DEFAULT_PAIR_NAMES: PairNames = { cause: 'X', effect: 'Y' };

/** "GateGasoil's", "Brent futures'": the possessive of a series name. */
export function possessive(name: string): string {
  return /s$/i.test(name) ? `${name}'` : `${name}'s`;
}

/** A p-value for a sentence: "p = 0.41", "p = 0.0004", "p < 0.0001". */
export function pText(p: number | null): string {
  if (p === null) return 'no p-value';
  if (p < 0.0001) return 'p < 0.0001';
  if (p < 0.001) return `p = ${p.toFixed(4)}`;
  if (p < 0.01) return `p = ${p.toFixed(3)}`;
  return `p = ${p.toFixed(2)}`;
}

/** A level as a percentage: 0.05 -> "5%". */
export function levelText(alpha: number): string {
  return `${Math.round(alpha * 1000) / 10}%`;
}

/** What the data are: prices as they stand, or their period-to-period changes. */
export type DataForm = 'values' | 'changes';

/** Null and alternative for a lead-lag test in which only the cause's past is tested. */
export function leadLagHypotheses(names: PairNames, form: DataForm): { nullHypothesis: string; alternative: string } {
  const past = form === 'changes' ? 'past changes' : 'past values';
  const next = form === 'changes' ? 'next change' : 'next value';
  const { cause, effect } = names;
  return {
    nullHypothesis: `${possessive(cause)} ${past} carry no information about ${possessive(effect)} ${next} beyond ${possessive(effect)} own past`,
    alternative: `${possessive(cause)} ${past} help predict ${possessive(effect)} ${next}: ${cause} leads ${effect}`,
  };
}

/** Null and alternative for the short-run part of the error-correction test. */
export function shortRunHypotheses(names: PairNames): { nullHypothesis: string; alternative: string } {
  const { cause, effect } = names;
  return {
    nullHypothesis: `${possessive(cause)} past changes carry no information about ${possessive(effect)} next change beyond ${possessive(effect)} own past changes and the gap from the long-run relation`,
    alternative: `${possessive(cause)} past changes help predict ${possessive(effect)} next change: ${cause} leads ${effect} in the short run`,
  };
}

/** Null and alternative for the long-run (error-correction coefficient) part. */
export function longRunHypotheses(names: PairNames): { nullHypothesis: string; alternative: string } {
  const { cause, effect } = names;
  return {
    nullHypothesis: `${effect} does not move to close the gap from its long-run relation with ${cause} (error-correction coefficient zero)`,
    alternative: `${effect} moves to close the gap from its long-run relation with ${cause}: ${cause} leads ${effect} in the long run`,
  };
}

/** The caution every lead-lag verdict carries. */
export const LEAD_LAG_CAUTION =
  'A lead-lag test is statistical evidence about past data, not trading advice: "leads" means the past of one series improved the prediction of the other in this sample; it does not prove cause and effect, and the relation can break down.';
