/**
 * Draws the current step: builds its view model from the pane's state and the report, and
 * hands it to the step's renderer with the actions its controls call.
 */
import { describeColumns } from './data/columns';
import { coverage, type PaneState } from './pane';
import type { PaneActions } from './pane-actions';
import { renderDataStep } from './render/data-step';
import { renderLeaderStep } from './render/leader-step';
import { pairPicker } from './render/pair-picker';
import { renderRelationStep } from './render/relation-step';
import { renderSeriesStep } from './render/series-step';
import { overviewTable, renderTiedStep } from './render/tied-step';
import { renderStabilitySection, type StabilitySectionState } from './render/stability-section';
import { pairOverview } from './views/pair-overview';
import { stabilityView } from './views/stability-view';
import { renderWriteStep } from './render/write-step';
import { el } from './dom';
import { dataStepView } from './views/data-view';
import { leaderStepView } from './views/leader-view';
import { chosenPair, pairOptions } from './views/pair-choice';
import { relationStepView } from './views/relation-view';
import { seriesStepView } from './views/series-view';
import { tiedStepView } from './views/tied-view';
import { writeStepView } from './views/write-view';

/** Where the "Through time" section of the shown pair stands. */
function stabilityState(s: PaneState, index: number): StabilitySectionState {
  const st = s.stability;
  if (!st || st.pairIndex !== index || !s.report) return { kind: 'idle' };
  if (st.status === 'running') return { kind: 'running' };
  if (st.status === 'failed' || !st.result) return { kind: 'failed', problem: st.problem ?? 'The check through time did not finish.' };
  return { kind: 'done', view: stabilityView(st.result, s.report.settings.alpha, s.report.data.period) };
}

/** The content of the current step. */
export function renderStep(s: PaneState, actions: PaneActions): HTMLElement {
  if (s.step === 'data') {
    const view = s.region ? dataStepView(s.region, describeColumns(s.region), s.choice.columns, s.prepared, s.prepareProblem) : null;
    const stale = s.report && s.reportOf && (!s.prepared || coverage(s.prepared) !== s.reportOf)
      ? `Steps 2 to 6 still show the last run (${s.reportOf}) until you run the diagnosis again.`
      : null;
    return renderDataStep(view, s.choice, s.region ? s.prepareProblem : s.regionProblem, stale, {
      detect: () => actions.detect(),
      change: (patch) => actions.changeData(patch),
      run: () => actions.runFromData(),
    }, s.running !== null);
  }
  const report = s.report;
  if (!report) return el('p', {}, 'Run the diagnosis first, from step 1.');
  if (s.step === 'series') return renderSeriesStep(seriesStepView(report), (k, v) => actions.changeStage(k, v));
  const chosen = chosenPair(report, s.pairIndex);
  if (!chosen) return el('p', {}, 'The report holds no pairs.');
  const picker = pairPicker(pairOptions(report), chosen.index, (i) => actions.pickPair(i));
  switch (s.step) {
    case 'tied': {
      const overview = report.pairs.length > 1
        ? overviewTable(pairOverview(report, s.overviewSort), chosen.index, { open: (i) => actions.openPair(i), sort: (k) => actions.sortOverview(k) })
        : null;
      return renderTiedStep(tiedStepView(report, chosen.pair), overview, (k, v) => actions.changeStage(k, v));
    }
    case 'relation':
      return renderRelationStep(relationStepView(report, chosen.pair), picker,
        renderStabilitySection(`${chosen.pair.a} and ${chosen.pair.b}`, stabilityState(s, chosen.index), { start: () => actions.checkStability(), cancel: () => actions.cancelStability() }));
    case 'leader':
      return renderLeaderStep(leaderStepView(report, chosen.pair), picker, (k, v) => actions.changeStage(k, v));
    default:
      return s.region
        ? renderWriteStep(writeStepView(s.region, chosen.pair, s.write), s.write, picker, {
            change: (patch) => actions.changeWrite(patch),
            write: () => actions.write(),
            confirm: (yes) => actions.confirm(yes),
          })
        : el('p', {}, 'Choose the data first.');
  }
}
