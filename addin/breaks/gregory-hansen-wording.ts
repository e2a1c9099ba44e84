/**
 * Plain words for the Gregory-Hansen result: what shifted, the relation either side of the
 * shift, and the verdict at the 5% level with the caution that relations break.
 */
import type { ResultDetail } from '../result';
import { gregoryHansenComparedLevels, type GregoryHansenModel } from '../tables/gregory-hansen-table';
import type { BreakLocation } from './break-location';
import { BREAKS_AGAIN_CAUTION, aroundText, formatNumber } from './break-wording';
import type { ShiftedRelation } from './gregory-hansen-design';

export const SHIFT_WORDS: Record<GregoryHansenModel, string> = {
  level: 'shift in level',
  'level-trend': 'shift in level (with a trend)',
  regime: 'shift in level and slopes',
};

/** The paper's name of each model. */
export const PAPER_MODEL: Record<GregoryHansenModel, string> = { level: 'C', 'level-trend': 'C/T', regime: 'C/S' };

/** "1%, 5% and 10%". */
function levelList(levels: readonly string[]): string {
  return listWords([...levels]);
}

/**
 * Where the row's critical values come from, in one or two sentences: Gregory & Hansen
 * (1996), Table 1, with the points that were compared with an independent typed copy of
 * the printed table said to be so, and the rest said to be from memory. Null beyond the table.
 */
export function criticalValueSourceText(model: GregoryHansenModel, m: number): string | null {
  const status = gregoryHansenComparedLevels(model, m);
  if (status === null) return null;
  const row = `model ${PAPER_MODEL[model]} with ${m} regressor${m === 1 ? '' : 's'}`;
  const head = `The critical values are asymptotic, from Gregory & Hansen (1996), Table 1 (${row}).`;
  if (status.compared.length === 0) {
    return `${head} This row is quoted from memory: it has not yet been compared with the printed table, so check it against the paper before relying on the second decimal.`;
  }
  const compared = `The ${levelList(status.compared)} points were compared with an independent typed copy of the printed table and agree to its two decimals`;
  if (status.fromMemory.length === 0) return `${head} ${compared}.`;
  const one = status.fromMemory.length === 1;
  return `${head} ${compared}; the ${levelList(status.fromMemory)} point${one ? ' is' : 's are'} quoted from memory, not yet compared.`;
}

/** Each lag rule by its trade name. */
const RULE_WORDS: Record<string, string> = { aic: 'AIC', bic: 'BIC', tstat: 'the t-statistic rule' };

/**
 * How the residual ADF's lags were set, as a phrase that reads after its label: "fixed",
 * "once, by AIC on the residual without the shift, then used at every date", or "by AIC
 * afresh at each candidate date".
 */
export function lagMethodText(rule: string, eachDate: boolean): string {
  if (rule === 'fixed') return 'fixed';
  const by = RULE_WORDS[rule] ?? rule;
  return eachDate ? `by ${by} afresh at each candidate date` : `once, by ${by} on the residual without the shift, then used at every date`;
}

/** "a, b and c". */
export function listWords(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** "y = 1.02 + 2 x - 0.5 z + 0.01 t". */
export function equationText(yName: string, intercept: number, slopes: readonly number[], xNames: readonly string[], trend: number | null): string {
  const term = (b: number, what: string): string => ` ${b < 0 ? '-' : '+'} ${formatNumber(Math.abs(b))}${what ? ` ${what}` : ''}`;
  let out = `${yName} = ${formatNumber(intercept)}`;
  slopes.forEach((b, j) => {
    out += term(b, xNames[j]);
  });
  if (trend !== null) out += term(trend, 't');
  return out;
}

/** The relation before and after the shift as labelled details. */
export function relationDetails(relation: ShiftedRelation, xNames: readonly string[]): ResultDetail[] {
  const out: ResultDetail[] = [
    { key: 'interceptBefore', label: 'Intercept before the shift', value: relation.interceptBefore },
    { key: 'interceptAfter', label: 'Intercept after the shift', value: relation.interceptAfter },
  ];
  xNames.forEach((name, j) => {
    out.push({ key: `slopeBefore${j + 1}`, label: `Coefficient on ${name} before the shift`, value: relation.slopesBefore[j] });
    out.push({ key: `slopeAfter${j + 1}`, label: `Coefficient on ${name} after the shift`, value: relation.slopesAfter[j] });
  });
  if (relation.trend !== null) out.push({ key: 'trendCoefficient', label: 'Coefficient on the trend t = 1..T', value: relation.trend });
  return out;
}

export interface VerdictInput {
  /** Rejection of no-cointegration at 5%, or null when no critical value exists. */
  decision: boolean | null;
  statistic: number;
  critical5: number | null;
  model: GregoryHansenModel;
  yName: string;
  xNames: readonly string[];
  location: BreakLocation;
  relation: ShiftedRelation;
  m: number;
}

/** The verdict at the 5% level, in words a trader can act on, ending with the caution. */
export function gregoryHansenVerdict(v: VerdictInput): string {
  const all = listWords([v.yName, ...v.xNames]);
  const stat = `ADF* = ${formatNumber(v.statistic)}`;
  if (v.decision === null) {
    return `${stat}. Gregory & Hansen (1996) published critical values for 1 to 4 regressors only, so with ${v.m} no decision can be read off. ${BREAKS_AGAIN_CAUTION}`;
  }
  const cv = `5% critical value ${formatNumber(v.critical5 as number)}, Gregory & Hansen 1996; no p-value is published`;
  if (!v.decision) {
    return (
      `No evidence at the 5% level that ${all} are cointegrated, even allowing one ${SHIFT_WORDS[v.model]} (${stat}, ${cv}): ` +
      `a spread between them need not return to any level. ${BREAKS_AGAIN_CAUTION}`
    );
  }
  const r = v.relation;
  const before = equationText(v.yName, r.interceptBefore, r.slopesBefore, v.xNames, r.trend);
  const after = equationText(v.yName, r.interceptAfter, r.slopesAfter, v.xNames, r.trend);
  return (
    `${all} appear cointegrated once one ${SHIFT_WORDS[v.model]} is allowed (${stat}, below the ${cv}). ` +
    `The relation between ${all} appears to shift ${aroundText(v.location)}: ${before} before, ${after} after. ` +
    'The test also rejects for a relation that never shifted, so judge the date by how far the coefficients moved. ' +
    BREAKS_AGAIN_CAUTION
  );
}
