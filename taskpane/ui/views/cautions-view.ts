/**
 * The cautions that go with every verdict: the engine's standing cautions (evidence, not
 * advice; relations break; screening turns up false discoveries, with this report's count;
 * the user's own policy first), plus any cautions of the stage itself. The pane shows the
 * standing ones once, in a box under the step strip that opens by itself the first time
 * results appear and stays one click away on every step after (cautionsSummary).
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';

/** The cautions box of a stage. */
export interface CautionsView {
  title: string;
  items: string[];
}

/** The cautions of a stage: the report's standing ones, then the stage's own (deduplicated). */
export function cautionsView(report: DiagnosticReport, extra: readonly string[] = []): CautionsView {
  const items: string[] = [];
  for (const text of [...report.cautions, ...extra]) if (!items.includes(text)) items.push(text);
  return { title: 'Before you rely on this', items };
}

/** The summary line of the pane's one cautions box, saying how many points it holds. */
export function cautionsSummary(view: CautionsView): string {
  return `${view.title} (${view.items.length} point${view.items.length === 1 ? '' : 's'})`;
}
