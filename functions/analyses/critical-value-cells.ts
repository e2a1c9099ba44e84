/**
 * MOOR.CRIT: one critical value from the published tables the tests use, so a user can check a
 * statistic by hand or build a threshold into a sheet.
 *
 *   adf, pp      tau, one series: MacKinnon (2010) surfaces (1996 for no constant) at T
 *                observations, asymptotic when T is left out
 *   eg, po       tau of a cointegrating residual with N variables (y plus the xs), same surfaces;
 *                Mooring's tests read them at T = the length of the series minus one
 *   po-alpha     Phillips-Ouliaris Z-alpha with N variables, asymptotic (from MacKinnon 1994)
 *   kpss         Kwiatkowski et al. (1992) Table 1, asymptotic
 *   johansen-trace, johansen-max
 *                Johansen trace / maximum-eigenvalue with "variables" = n - r common trends,
 *                asymptotic, in one of the five deterministic cases
 * Lower-tail tables (tau, Z-alpha): reject below the value. Upper-tail (KPSS, Johansen): above.
 */
import { MooringInputError } from '../../addin/errors';
import { rankCriticalValues } from '../../addin/johansen/rank-test-tables';
import { kpssCriticalValues } from '../../addin/tables/kpss-table';
import { mackinnonCriticalValues, tableCaseOf } from '../../addin/tables/mackinnon-tau';
import { zCriticalValues } from '../../addin/tables/mackinnon-z';
import { NoValue } from '../cells/no-value';
import { isOmitted, levelValue, optionWord, wholeNumber } from '../options/option-values';
import { DETERMINISTIC_WORDS, JOHANSEN_CASES, KPSS_DETERMINISTIC_WORDS } from '../options/option-words';

export const CRITICAL_TESTS = ['adf', 'pp', 'eg', 'po', 'po-alpha', 'kpss', 'johansen-trace', 'johansen-max'] as const;
type CriticalTest = (typeof CRITICAL_TESTS)[number];

function asymptoticOnly(test: CriticalTest, observations: unknown): void {
  if (!isOmitted(observations)) {
    throw new MooringInputError(`The ${test} table is asymptotic: it has no sample-size correction, so leave observations empty.`);
  }
}

function exactlyOne(test: CriticalTest, variables: unknown): void {
  const n = wholeNumber('variables', variables, 1, 'series', 1);
  if (n !== 1) throw new MooringInputError(`The ${test} table is for one series; for the residual of several series use eg or po.`);
}

/** The table's values by level ("1%", "5%", ...) for the arguments given. */
function tableFor(test: CriticalTest, observations: unknown, variables: unknown, deterministic: unknown): Record<string, number> {
  switch (test) {
    case 'adf':
    case 'pp': {
      exactlyOne(test, variables);
      const T = wholeNumber('observations', observations, undefined, 'observations', 1);
      const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
      return { ...mackinnonCriticalValues(tableCaseOf(det), 1, T ?? null) };
    }
    case 'eg':
    case 'po': {
      const N = wholeNumber('variables', variables, 2, 'series (y plus the xs)', 2);
      const T = wholeNumber('observations', observations, undefined, 'observations', 1);
      const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
      return { ...mackinnonCriticalValues(tableCaseOf(det), N, T ?? null) };
    }
    case 'po-alpha': {
      asymptoticOnly(test, observations);
      const N = wholeNumber('variables', variables, 2, 'series (y plus the xs)', 2);
      const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
      const cv = zCriticalValues(tableCaseOf(det), N);
      if (cv === null) throw new NoValue(`No Z-alpha table covers ${N} variables: the published surfaces stop at 6.`);
      return { ...cv };
    }
    case 'kpss': {
      asymptoticOnly(test, observations);
      exactlyOne(test, variables);
      return { ...kpssCriticalValues(optionWord('deterministic', deterministic, KPSS_DETERMINISTIC_WORDS, 'const')) };
    }
    case 'johansen-trace':
    case 'johansen-max': {
      asymptoticOnly(test, observations);
      const trends = wholeNumber('variables', variables, 1, 'common trends (series minus relations)', 1);
      const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
      return rankCriticalValues(test === 'johansen-trace' ? 'trace' : 'maxEigen', caseName, trends).critical;
    }
  }
}

/** One critical value at the given level. */
export function critCell(test: unknown, observations: unknown, variables: unknown, deterministic: unknown, level: unknown): number {
  if (isOmitted(test)) throw new MooringInputError(`Name the test: one of ${CRITICAL_TESTS.join(', ')}.`);
  const which = optionWord('test', test, CRITICAL_TESTS, 'adf');
  const alpha = levelValue('level', level, 0.05);
  const table = tableFor(which, observations, variables, deterministic);
  const levels = Object.keys(table);
  // Match the level against the table's own levels ("1%" is 0.01) rather than writing the level
  // as a percentage first: 1e-300 would become "1e-298%".
  const key = levels.find((k) => Math.abs(Number(k.replace('%', '')) / 100 - alpha) <= 1e-9 * alpha);
  if (key === undefined) {
    const decimals = levels.map((k) => String(Number(k.replace('%', '')) / 100));
    throw new MooringInputError(
      `The ${which} table gives critical values at ${levels.join(', ')} only; level ${levelText(alpha)} is not among them: ` +
        `give one of ${decimals.join(', ')} (or ${levels.join(', ')} as text).`,
    );
  }
  return table[key];
}

/** A level for a message: as a percentage where that reads plainly (2.5%), else as the number given (1e-300). */
function levelText(alpha: number): string {
  const percent = alpha * 100;
  return percent >= 0.01 && Number(percent.toPrecision(4)) === Number(percent.toPrecision(12)) ? `${Number(percent.toPrecision(4))}%` : String(alpha);
}
