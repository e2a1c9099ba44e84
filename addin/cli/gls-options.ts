/** Options of the commands on GLS-detrended data (dfgls, ngperron): terms removed and the lag rule. */
import { MooringInputError } from '../errors';
import type { GlsDeterministic } from '../unitroot/gls-detrend';
import { GLS_LAG_RULES, type GlsLagOption } from '../unitroot/gls-lag-search';
import type { OptionSpec, ParsedArguments } from './arguments';
import { choiceValue, countOrWordValue, wholeNumberValue } from './option-values';

export const GLS_OPTIONS: OptionSpec[] = [
  { name: 'deterministic', value: 'const|trend', help: 'terms removed by GLS before the test: const (a constant; the default) or trend (constant and linear trend)' },
  { name: 'lags', value: 'N|maic|aic|bic', help: 'exactly N lagged differences, or a rule that chooses them (default maic, the modified AIC of Ng & Perron 2001)' },
  { name: 'max-lags', value: 'N', help: "largest lag a rule may choose (default: Schwert's rule, 12 (n/100)^(1/4))" },
];

/** Reads --deterministic, --lags and --max-lags of a GLS command. */
export function readGlsOptions(args: ParsedArguments): { deterministic: GlsDeterministic; lags: GlsLagOption; maxLags?: number } {
  const deterministic = choiceValue('deterministic', args.values.get('deterministic'), ['const', 'trend'] as const) ?? 'const';
  const lags = countOrWordValue('lags', args.values.get('lags'), 'lagged differences', GLS_LAG_RULES) ?? 'maic';
  const maxLags = wholeNumberValue('max-lags', args.values.get('max-lags'), 'lags');
  if (typeof lags === 'number' && maxLags !== undefined) {
    throw new MooringInputError(`--max-lags applies only when a rule chooses the lags (--lags maic, aic or bic); with --lags ${lags} leave it out.`);
  }
  return maxLags === undefined ? { deterministic, lags } : { deterministic, lags, maxLags };
}
