/**
 * The headline findings and the report-wide warnings. Findings are the sentences a reader
 * should see first: which series wander and which do not, each pair that shares a long-run
 * relation with its relation, half-life, position and leader, then in one sentence each the
 * pairs that do not and the pairs whose inputs are not I(1), any lead-lag found between
 * unrelated pairs (flagged as possibly chance), and the system's rank. Warnings gather what every
 * finding rests on: sample length, dropped rows and uncertain orders (each pair keeps its own).
 */
import { listNames } from '../johansen/johansen-warnings';
import type { PairReport } from './pair-types';
import { headlinePValue } from './pair-cointegration';
import type { DataSection, Finding, SeriesReport, SystemReport } from './report-types';

/** Fewer observations than this draw a short-sample warning (common practice for cointegration work). */
export const SHORT_SAMPLE = 100;

/** The findings, in reading order. */
export function reportFindings(series: readonly SeriesReport[], pairs: readonly PairReport[], system: SystemReport | null): Finding[] {
  const out: Finding[] = [];
  const wandering = series.filter((s) => s.order === 1).map((s) => s.name);
  if (wandering.length > 0) {
    out.push({
      about: 'series',
      names: wandering,
      text: `${listNames(wandering)} ${wandering.length === 1 ? 'wanders' : 'wander'} (I(1)): the level has no fixed mean to return to, while the changes are stationary.`,
    });
  }
  for (const s of series.filter((v) => v.order !== 1)) out.push({ about: 'series', names: [s.name], text: s.verdict });

  const related = pairs.filter((p) => p.cointegration.cointegrated);
  related.sort((u, v) => (headlinePValue(u.cointegration) ?? 1) - (headlinePValue(v.cointegration) ?? 1));
  for (const p of related) for (const text of p.verdicts) out.push({ about: 'pair', names: [p.a, p.b], text });
  const unrelated = pairs.filter((p) => p.cointegration.bothIntegrated && !p.cointegration.cointegrated);
  if (unrelated.length > 0) {
    out.push({
      about: 'pair',
      names: [...new Set(unrelated.flatMap((p) => [p.a, p.b]))],
      text: `No evidence of a long-run relation (Engle-Granger, either direction) between ${listNames(unrelated.map((p) => `${p.a} and ${p.b}`))}.`,
    });
  }
  const offOrder = series.filter((s) => s.order !== 1).map((s) => s.name);
  if (offOrder.length > 0 && pairs.some((p) => !p.cointegration.bothIntegrated)) {
    out.push({
      about: 'pair',
      names: offOrder,
      text: `Pairs with ${listNames(offOrder)} are not read as long-run relations: cointegration tests assume I(1) inputs, and ${listNames(offOrder)} ${offOrder.length === 1 ? 'is' : 'are'} not I(1).`,
    });
  }
  for (const p of pairs.filter((q) => !q.cointegration.cointegrated)) {
    if (p.leadLag && p.leadLag.pattern !== 'neither') {
      out.push({ about: 'pair', names: [p.a, p.b], text: `${p.leadLag.verdict} With no long-run relation between them and many pairs screened, this may be chance.` });
    }
  }
  if (system) out.push({ about: 'system', names: series.map((s) => s.name), text: system.verdict });
  return out;
}

/** The report-wide warnings: the data's and each series'. Each pair keeps its own warnings. */
export function reportWarnings(data: DataSection, series: readonly SeriesReport[]): string[] {
  const out: string[] = [];
  if (data.observations < SHORT_SAMPLE) {
    out.push(`Only ${data.observations} observations: cointegration and lead-lag tests have little power in samples this short, and a relation may go unseen.`);
  }
  if (data.dropped.length > 0) {
    out.push(`${data.dropped.length} cell${data.dropped.length === 1 ? ' was' : 's were'} dropped as gaps (listed under the data); the rows either side are treated as consecutive.`);
  }
  for (const s of series) for (const w of s.warnings) out.push(w);
  return out;
}
