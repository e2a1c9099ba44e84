/**
 * MOOR.GRANGER and MOOR.VARLAGS: the lead-lag test of a pair and the lag order of a VAR.
 *
 * GRANGER runs the engine's leadLag, which picks a test that is valid for the data (method
 * auto, the default): the F test on the values for stationary series, on the changes for
 * wandering ones, Toda-Yamamoto when the orders differ or are uncertain. f, ty and ecm ask for
 * the F test, Toda-Yamamoto or the error-correction form, as on the command line. One argument
 * says both which test and, for the F test, which data: levels is the F test on the values as
 * given (the command line's --method f --data levels), changes the F test on their changes
 * (--method f --data changes), f the F test on the data the orders call for (--data auto).
 * The results block writes "levels" or "changes" to reproduce the test the report ran. The headline
 * is the p-value of the cause -> effect direction; the table adds why that test was used, the
 * reverse direction and the cautions.
 */
import { leadLag, type LeadLagData, type LeadLagDirection, type LeadLagMethod } from '../../addin/causality/lead-lag';
import type { ResultDetail } from '../../addin/result';
import { chooseVarLags } from '../../addin/var/choose-var-lags';
import { readBlock, readPair } from '../cells/range-input';
import { countOrWord, optionWord, prepValue, wholeNumber } from '../options/option-values';
import { VAR_CRITERIA, VAR_LAG_RULES } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

/** The method words of MOOR.GRANGER: the command line's methods, and the F test on levels or on changes. */
const GRANGER_METHOD_WORDS = ['auto', 'f', 'levels', 'changes', 'ty', 'ecm'] as const;
type GrangerMethodWord = (typeof GRANGER_METHOD_WORDS)[number];

/** The engine's method and data for a method word. */
function methodAndData(word: GrangerMethodWord): { method: LeadLagMethod; data: LeadLagData } {
  if (word === 'levels' || word === 'changes') return { method: 'f', data: word };
  return { method: word, data: 'auto' };
}

function directionDetails(d: LeadLagDirection, tag: string, what: string): ResultDetail[] {
  const out: ResultDetail[] = [{ key: `${tag}PValue`, label: `p-value, ${what}`, value: d.test.pValue }];
  if (d.longRun !== null) out.push({ key: `${tag}LongRunPValue`, label: `p-value of the long-run part, ${what}`, value: d.longRun.pValue });
  out.push({ key: `${tag}Leads`, label: `Lead found at 5%, ${what}`, value: d.leads });
  return out;
}

export function grangerCell(cause: unknown, effect: unknown, lags: unknown, method: unknown, show: unknown, prep?: unknown) {
  const lagChoice = countOrWord('lags', lags, VAR_LAG_RULES, 'aic', 'lags', 1);
  const which = methodAndData(optionWord('method', method, GRANGER_METHOD_WORDS, 'auto'));
  const pair = readPair(effect, cause, { y: 'effect', x: 'cause' }, 'the lead-lag test', prepValue(prep));
  const result = leadLag(pair.x.values, pair.y.values, { lags: lagChoice, ...which }, ['cause', 'effect']);
  const main = result.aLeadsB;
  const details: ResultDetail[] = [
    { key: 'testUsed', label: 'Why this test', value: result.why },
    { key: 'data', label: 'Data tested', value: result.data === 'levels' ? 'levels (the values as given)' : 'changes (first differences)' },
    { key: 'orders', label: 'Orders of integration (cause, effect)', value: `${result.orders.a}, ${result.orders.b} (${result.orders.source})` },
    ...directionDetails(main, 'forward', 'cause leads effect'),
    ...directionDetails(result.bLeadsA, 'reverse', 'effect leads cause'),
    ...result.cautions.slice(1).map((c, i) => ({ key: `leadCaution${i + 1}`, label: 'Caution on this test', value: c })),
  ];
  return showAnswer(testAnswer(main.test, { verdict: result.verdict, details }), show);
}

/** The VAR lag order a criterion chooses for the block. */
export function varLagsCell(block: unknown, criterion: unknown, maxlags: unknown, prep?: unknown): number {
  const which = optionWord('criterion', criterion, VAR_CRITERIA, 'aic');
  const ceiling = wholeNumber('maxlags', maxlags, undefined, 'lags', 1);
  const series = readBlock(block, 'the block', prepValue(prep));
  const choice = chooseVarLags(series.map((s) => s.values), { maxLags: ceiling, names: series.map((s) => s.name) });
  return choice[which];
}
