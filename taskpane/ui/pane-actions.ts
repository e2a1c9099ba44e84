/**
 * What the pane's controls do to its state: the data step's choices (each prepares the input
 * again so the rows-used line is current), the stage choices (each runs the diagnosis
 * again), the pair picker and the overview of all pairs, the check of a pair through time
 * (asked of the worker on demand), and the write step's plan, yes or no, and write. Each
 * block written is remembered by its own name, so a refresh rewrites every one of them.
 */
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { BlockPlacement } from '../block/pair-block';
import type { DataRegion } from '../workbook/port';
import type { DataChoice } from './data/prepare-data';
import type { PaneDeps, PaneState } from './pane';
import type { StepId } from './steps';
import type { ChoiceKey } from './views/choices';
import { chosenPair } from './views/pair-choice';
import type { OverviewKey } from './views/pair-overview';
import type { WriteState } from './views/write-view';
import { placementFor, planPairWrite, rewriteBlock, tableOfRegion, writePlan } from './write-actions';

/** The pane's internals the actions use. */
export interface PaneInternals {
  render(): void;
  run(then: StepId | null): void;
  prepare(): void;
  open(id: StepId): void;
  rewatch(): Promise<void>;
  /** Looks for the data around the selection again. */
  detectAgain(): void;
}

/** The actions of the pane's controls. */
export interface PaneActions {
  detect(): void;
  changeData(patch: Partial<DataChoice>): void;
  runFromData(): void;
  changeStage(key: ChoiceKey, value: string): void;
  pickPair(index: number): void;
  /** Opens a pair from the overview: shows it and moves focus to its details. */
  openPair(index: number): void;
  /** Sorts the overview by a column; the same column again turns the order round. */
  sortOverview(key: OverviewKey): void;
  /** Asks the worker how the shown pair held through time. */
  checkStability(): void;
  cancelStability(): void;
  changeWrite(patch: Partial<WriteState>): void;
  write(): void;
  confirm(yes: boolean): void;
  rewrite(report: DiagnosticReport, pair: { a: string; b: string }, region: DataRegion, placement: BlockPlacement, name: string): Promise<boolean>;
}

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

/** Builds the actions over the pane's state. */
export function createActions(s: PaneState, deps: PaneDeps, pane: PaneInternals): PaneActions {
  const pairNames = (): { a: string; b: string } | null => {
    const chosen = s.report ? chosenPair(s.report, s.pairIndex) : null;
    return chosen ? { a: chosen.pair.a, b: chosen.pair.b } : null;
  };
  const finishWrite = async (confirmed: boolean): Promise<void> => {
    const plan = s.write.plan;
    if (!plan) return;
    s.write = { ...s.write, busy: true };
    pane.render();
    const outcome = await writePlan(deps.port, plan, confirmed);
    s.write = { ...s.write, busy: false, outcome };
    const pair = pairNames();
    if (outcome.ok && pair) {
      const entry = { name: plan.block.name, pair, placement: { sheet: plan.block.sheet, anchor: plan.block.anchor } };
      s.written = [...s.written.filter((w) => w.name.toLowerCase() !== entry.name.toLowerCase()), entry];
    }
    pane.render();
  };
  return {
    detect() {
      pane.detectAgain();
    },
    changeData(patch) {
      s.choice = { ...s.choice, ...patch };
      pane.prepare();
      pane.render();
    },
    runFromData() {
      pane.run('series');
    },
    changeStage(key, value) {
      s.stage = { ...s.stage, [key]: value } as PaneState['stage'];
      pane.run(null);
    },
    pickPair(index) {
      s.pairIndex = index;
      s.write = { ...s.write, plan: null, outcome: null, problem: null };
      pane.render();
    },
    openPair(index) {
      s.pairIndex = index;
      s.write = { ...s.write, plan: null, outcome: null, problem: null };
      pane.render();
      const detail = document.getElementById('pair-detail');
      detail?.focus();
      detail?.scrollIntoView?.({ block: 'start' });
    },
    sortOverview(key) {
      const now = s.overviewSort;
      s.overviewSort = { key, descending: now.key === key ? !now.descending : false };
      pane.render();
    },
    checkStability() {
      const chosen = s.report ? chosenPair(s.report, s.pairIndex) : null;
      if (!s.report || !chosen || !s.reportInput || s.stability?.status === 'running') return;
      const p = chosen.pair;
      const pair = { y: p.relation?.dependent ?? p.a, x: p.relation?.regressor ?? p.b };
      const handle = deps.runner.stability(s.reportInput.input, s.reportInput.options, pair);
      const ask = { pairIndex: chosen.index, status: 'running' as const, result: null, problem: null, cancel: handle.cancel };
      s.stability = ask;
      pane.render();
      void handle.outcome.then((o) => {
        if (s.stability !== ask) return;
        s.stability = o.kind === 'done'
          ? { ...ask, status: 'done', result: o.stability }
          : o.kind === 'failed' ? { ...ask, status: 'failed', problem: o.message } : null;
        pane.render();
      });
    },
    cancelStability() {
      s.stability?.cancel();
      s.stability = null;
      pane.render();
    },
    changeWrite(patch) {
      s.write = { ...s.write, ...patch };
      pane.render();
    },
    write() {
      const pair = pairNames();
      if (!s.report || !s.region || !pair) return;
      const report = s.report;
      s.write = { ...s.write, busy: true, plan: null, outcome: null, problem: null, tableNote: null };
      pane.render();
      void (async () => {
        try {
          if (!s.region) return;
          if (s.write.makeTable && !s.region.tableName) {
            const made = await tableOfRegion(deps.port, s.region);
            s.region = made.region;
            s.write = { ...s.write, tableNote: made.note };
            await pane.rewatch();
          }
          const placement = await placementFor(deps.port, s.region, s.write.place, s.write.cell);
          const plan = await planPairWrite(deps.port, report, pair, s.region, placement);
          s.write = { ...s.write, plan, busy: false };
          if (plan.safe) await finishWrite(false);
          else pane.render();
        } catch (e) {
          s.write = { ...s.write, busy: false, problem: message(e) };
          pane.render();
        }
      })();
    },
    confirm(yes) {
      if (yes) {
        void finishWrite(true);
        return;
      }
      s.write = { ...s.write, plan: null, problem: 'Nothing was written: the filled cells were kept. Choose another place, or write again and say yes.' };
      pane.render();
    },
    rewrite(report, pair, region, placement, name) {
      return rewriteBlock(deps.port, report, pair, region, placement, name).catch(() => false);
    },
  };
}
