/**
 * Options shared by the test commands (deterministic terms, lags, bandwidth, the unit-root test) with their
 * help lines and readers, so each command declares them the same way.
 */
import { MooringInputError } from '../errors';
import { DETERMINISTIC_WORDS, type Deterministic } from '../result';
import type { OptionSpec, ParsedArguments } from './arguments';
import { choiceValue, countOrWordValue, wholeNumberValue } from './option-values';

/** Lag rules a user may name. */
export const LAG_RULE_WORDS = ['aic', 'bic', 'tstat'] as const;

const DETERMINISTIC_HELP: Record<Deterministic, string> = {
  none: 'none (no constant)',
  const: 'const (a constant; the default)',
  trend: 'trend (constant and linear trend)',
};

/** The --deterministic option over the given words. */
export function deterministicOption(words: readonly Deterministic[]): OptionSpec {
  return { name: 'deterministic', value: words.join('|'), help: `terms in the test regression: ${words.map((w) => DETERMINISTIC_HELP[w]).join(', ')}` };
}

/** The --lags option. */
export const LAGS_OPTION: OptionSpec = {
  name: 'lags', value: 'N|aic|bic|tstat',
  help: 'exactly N lagged differences, or a rule that chooses them (default aic)',
};

/** The --max-lags option. */
export const MAX_LAGS_OPTION: OptionSpec = {
  name: 'max-lags', value: 'N',
  help: "largest lag a rule may choose (default: Schwert's rule, 12 (n/100)^(1/4))",
};

/** The --bandwidth option. */
export const BANDWIDTH_OPTION: OptionSpec = {
  name: 'bandwidth', value: 'N|auto',
  help: 'exactly N lags in the Bartlett kernel, or auto (Newey-West automatic choice; the default)',
};

/** The tests a user may name to decide whether a series' levels wander. */
export const UNIT_ROOT_WORDS = ['adf', 'dfgls'] as const;

/** The --unit-root option of `order` and `report`: which test decides the levels step of each order. */
export const UNIT_ROOT_OPTION: OptionSpec = {
  name: 'unit-root', value: UNIT_ROOT_WORDS.join('|'),
  help: 'the test that decides whether the levels wander: adf (the default) or dfgls (more power against a slow return to a mean); the changes are always tested by adf',
};

/** Reads --unit-root; 'adf' when absent. */
export function readUnitRootTest(args: ParsedArguments): (typeof UNIT_ROOT_WORDS)[number] {
  return choiceValue(UNIT_ROOT_OPTION.name, args.values.get(UNIT_ROOT_OPTION.name), UNIT_ROOT_WORDS) ?? 'adf';
}

/** Reads --deterministic against the allowed words; `fallback` when absent. */
export function readDeterministic<T extends Deterministic>(args: ParsedArguments, allowed: readonly T[], fallback: T): T {
  return choiceValue('deterministic', args.values.get('deterministic'), allowed) ?? fallback;
}

/** All deterministic words (for the tests that allow none). */
export const ALL_DETERMINISTIC: readonly Deterministic[] = DETERMINISTIC_WORDS;

/** Reads --lags and --max-lags together: a maximum only makes sense with a rule. */
export function readLags(args: ParsedArguments): { lags: number | (typeof LAG_RULE_WORDS)[number]; maxLags?: number } {
  const lags = countOrWordValue('lags', args.values.get('lags'), 'lagged differences', LAG_RULE_WORDS) ?? 'aic';
  const maxLags = wholeNumberValue('max-lags', args.values.get('max-lags'), 'lags');
  if (typeof lags === 'number' && maxLags !== undefined) {
    throw new MooringInputError(`--max-lags applies only when a rule chooses the lags (--lags aic, bic or tstat); with --lags ${lags} leave it out.`);
  }
  return maxLags === undefined ? { lags } : { lags, maxLags };
}

/** Reads --bandwidth. */
export function readBandwidth(args: ParsedArguments): number | 'auto' {
  return countOrWordValue('bandwidth', args.values.get('bandwidth'), 'kernel lags', ['auto'] as const) ?? 'auto';
}
