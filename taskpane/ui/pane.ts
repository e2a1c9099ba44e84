/**
 * The guided pane: holds the walk's state and draws the current step from its view model.
 * It reaches the workbook only through the port, runs the engine only through the runner
 * (a Web Worker), and re-renders after every change, putting keyboard focus back on the
 * control that had it. Alt+Right and Alt+Left move between steps from anywhere on the page;
 * Esc cancels a running diagnosis (or a running check through time). The standing cautions are
 * shown once, in one box under the step strip: open the first time results appear, then
 * folded to its summary line on every step, one click away.
 */
import type { DiagnosticOptions } from '../../addin/report/check-input';
import type { DiagnosticInput } from '../../addin/report/prepare-input';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { PairStability } from '../worker/stability-job';
import { cautionsBox } from './render/parts';
import { cautionsView } from './views/cautions-view';
import { DEFAULT_OVERVIEW_SORT, type OverviewSort } from './views/pair-overview';
import type { DataRegion, WorkbookPort } from '../workbook/port';
import type { DiagnosisRunner } from '../worker/diagnosis-runner';
import { defaultPick, describeColumns } from './data/columns';
import { prepareData, type DataChoice, type PreparedData } from './data/prepare-data';
import { append, clear, el } from './dom';
import { renderProgressPanel } from './progress-panel';
import { drawChartSlots } from './render/chart-slot';
import type { DrawnChart } from './charts/line-chart';
import { renderStep } from './render-step';
import { renderStepStrip } from './step-strip';
import { STEPS, stepIndex, type StepId } from './steps';
import { DEFAULT_CHOICES, type StageChoices } from './views/choices';
import { refreshNotice } from './views/refresh-notice';
import { initialWriteState, type WriteState } from './views/write-view';
import type { BlockPlacement } from '../block/pair-block';
import { watchRegion } from './watch-region';
import { createActions } from './pane-actions';
import type { RegionChange } from '../workbook/port';

/** Everything the pane needs from outside. */
export interface PaneDeps {
  port: WorkbookPort;
  runner: DiagnosisRunner;
}

/** The pane's state (exported for the step renderer). */
export interface PaneState {
  step: StepId;
  region: DataRegion | null;
  regionProblem: string | null;
  choice: DataChoice;
  prepared: PreparedData | null;
  prepareProblem: string | null;
  stage: StageChoices;
  report: DiagnosticReport | null;
  /** Data rows of the region when the report was made. */
  reportRows: number;
  /** What the report covers, in words ("GateGasoil, DockDiesel on Prices!A1:G781"). */
  reportOf: string | null;
  running: { started: number; size: { series: number; pairs: number; rows: number } | null; cancel: () => void } | null;
  runProblem: string | null;
  notice: string | null;
  pairIndex: number | null;
  write: WriteState;
  /** The blocks written, each by its own workbook-level name, to write again when the data grow. */
  written: { name: string; pair: { a: string; b: string }; placement: BlockPlacement }[];
  /** The input and options the report was made from (the check through time runs on the same rows). */
  reportInput: { input: DiagnosticInput; options: DiagnosticOptions } | null;
  /** How the overview of all pairs is sorted. */
  overviewSort: OverviewSort;
  /** Whether the cautions box is open. */
  cautionsOpen: boolean;
  /** The check through time of one pair of the report (null: not asked, or cancelled). */
  stability: { pairIndex: number; status: 'running' | 'done' | 'failed'; result: PairStability | null; problem: string | null; cancel: () => void } | null;
}

/** The mounted pane. */
export interface PaneHandle {
  state(): PaneState;
  /** Looks for the data around the selection again. */
  detect(): Promise<void>;
  destroy(): void;
}

/** What a prepared input covers, in words, to tell whether the report in hand is of the data on screen. */
export function coverage(prepared: PreparedData): string {
  const how = prepared.prepText ? `, prepared as "${prepared.prepText}"` : '';
  return `${prepared.names.join(', ')} on ${prepared.input.source ?? 'the sheet'}${how}`;
}

/** Mounts the pane into `root`. */
export function mountPane(root: HTMLElement, deps: PaneDeps): PaneHandle {
  const s: PaneState = {
    step: 'data', region: null, regionProblem: null,
    choice: { columns: [], log: true, skipGaps: true, from: null, to: null, alpha: 0.05 },
    prepared: null, prepareProblem: null, stage: { ...DEFAULT_CHOICES }, report: null, reportRows: 0, reportOf: null,
    running: null, runProblem: null, notice: null, pairIndex: null, write: initialWriteState(), written: [],
    reportInput: null, overviewSort: DEFAULT_OVERVIEW_SORT, cautionsOpen: false, stability: null,
  };
  let charts: DrawnChart[] = [];
  let ticker: ReturnType<typeof setInterval> | null = null;
  let unwatch: (() => void) | null = null;
  // A change that arrived while a run was going; handled when the run ends.
  let pendingChange: RegionChange | null = null;

  const prepare = (): void => {
    s.prepared = null;
    s.prepareProblem = null;
    if (!s.region) return;
    try {
      s.prepared = prepareData(s.region, s.choice);
    } catch (e) {
      s.prepareProblem = e instanceof Error ? e.message : String(e);
    }
  };

  const focusKey = (): string | null => {
    const active = document.activeElement as HTMLElement | null;
    if (!active || !root.contains(active)) return null;
    const keyed = active.closest<HTMLElement>('[data-step],[data-role],[data-column],[data-choice]');
    if (!keyed) return null;
    for (const a of ['data-step', 'data-role', 'data-column', 'data-choice']) if (keyed.hasAttribute(a)) return `[${a}="${CSS.escape(keyed.getAttribute(a) ?? '')}"]`;
    return null;
  };

  const render = (): void => {
    const key = focusKey();
    charts.forEach((c) => c.destroy());
    charts = [];
    clear(root);
    const info = STEPS[stepIndex(s.step)];
    append(root,
      renderStepStrip(s.step, s.report !== null, (id) => open(id)),
      el('h2', { class: 'step-title', id: 'step-title', tabindex: '-1' }, `${stepIndex(s.step) + 1}. ${info.title}`),
      el('p', { class: 'purpose' }, info.purpose),
      s.notice ? el('p', { class: 'notice', role: 'status', 'data-role': 'notice' }, s.notice) : null,
      s.running ? renderProgressPanel(s.running.size, Math.floor((Date.now() - s.running.started) / 1000), () => s.running?.cancel()) : null,
      s.runProblem ? el('p', { class: 'problem', role: 'alert', 'data-role': 'run-problem' }, s.runProblem) : null,
      s.report && s.step !== 'data' ? cautionsBox(cautionsView(s.report), s.cautionsOpen, (open) => {
        s.cautionsOpen = open;
      }) : null,
      renderStep(s, actions),
      footer());
    charts = drawChartSlots(root);
    if (key) root.querySelector<HTMLElement>(key)?.focus();
  };

  const footer = (): HTMLElement => {
    const i = stepIndex(s.step);
    const back = el('fluent-button', { appearance: 'secondary', 'data-role': 'back', disabled: i === 0 }, 'Back');
    back.addEventListener('click', () => open(STEPS[i - 1].id));
    const canNext = i < STEPS.length - 1 && s.report !== null && !s.running;
    const next = el('fluent-button', { appearance: 'secondary', 'data-role': 'next', disabled: !canNext }, i === STEPS.length - 1 ? 'Last step' : `Next: ${STEPS[i + 1].title}`);
    next.addEventListener('click', () => open(STEPS[i + 1].id));
    return el('div', { class: 'step-nav' }, back, next);
  };

  const open = (id: StepId): void => {
    if (STEPS[stepIndex(id)].needsReport && !s.report) return;
    // A notice is read where it appeared; moving on clears it. The cautions, once shown open,
    // fold to their summary line when the reader moves on.
    if (id !== s.step) {
      s.notice = null;
      if (s.step !== 'data') s.cautionsOpen = false;
    }
    s.step = id;
    render();
    root.querySelector<HTMLElement>('#step-title')?.focus();
  };

  const run = (then: StepId | null, notice: ((before: number) => Promise<string>) | null = null): void => {
    if (!s.prepared || s.running) return;
    const prepared = s.prepared;
    const regionRows = prepared.regionRows;
    const options: DiagnosticOptions = { log: s.choice.log, alpha: s.choice.alpha, window: prepared.window, preparation: prepared.prepText, ...s.stage };
    const handle = deps.runner.run(prepared.input, options, (size) => {
      if (s.running) s.running.size = size;
      render();
    });
    s.running = { started: Date.now(), size: null, cancel: handle.cancel };
    s.runProblem = null;
    if (!notice) s.notice = null;
    ticker = setInterval(() => {
      const text = root.querySelector('[data-role="progress-text"]');
      if (text && s.running) text.textContent = text.textContent?.replace(/\d+ s so far/, `${Math.floor((Date.now() - s.running.started) / 1000)} s so far`) ?? '';
    }, 1000);
    render();
    void handle.outcome.then(async (outcome) => {
      if (ticker) clearInterval(ticker);
      ticker = null;
      s.running = null;
      if (outcome.kind === 'cancelled') {
        s.notice = 'The diagnosis was cancelled: nothing changed. Run it again when you are ready.';
      } else if (outcome.kind === 'failed') {
        s.runProblem = outcome.message;
      } else {
        const before = s.reportRows;
        // The first results open the cautions box; later runs leave it as the reader left it.
        if (!s.report) s.cautionsOpen = true;
        s.report = outcome.report;
        s.reportInput = { input: prepared.input, options };
        s.stability?.cancel();
        s.stability = null;
        s.reportRows = regionRows;
        s.reportOf = coverage(prepared);
        if (s.pairIndex !== null && s.pairIndex >= outcome.report.pairs.length) s.pairIndex = null;
        if (notice) s.notice = await notice(before);
        if (then) s.step = then;
        await ensureWatching();
      }
      render();
      if (then && outcome.kind === 'done') root.querySelector<HTMLElement>('#step-title')?.focus();
      const waiting = pendingChange;
      pendingChange = null;
      if (waiting) void refreshFromSheet(waiting);
    });
  };

  const ensureWatching = async (): Promise<void> => {
    if (unwatch || !s.region) return;
    unwatch = await watchRegion(deps.port, s.region, (change) => void refreshFromSheet(change));
  };

  const refreshFromSheet = async (change: RegionChange): Promise<void> => {
    if (!s.region) return;
    if (s.running) {
      pendingChange = change;
      return;
    }
    try {
      s.region = await deps.port.readRegion(change.sheet, change.address);
    } catch (e) {
      s.notice = `The table changed, but the pane could not read it again: ${e instanceof Error ? e.message : String(e)}`;
      render();
      return;
    }
    prepare();
    if (!s.prepared) {
      s.notice = `The table changed, but the pane could not use it: ${s.prepareProblem ?? 'unknown problem'}`;
      render();
      return;
    }
    run(null, async (before) => {
      const report = s.report;
      const region = s.region;
      if (s.written.length === 0 || !report || !region) return refreshNotice(before, s.reportRows, null);
      // One block after another: each write plans against the sheet as the previous one left it.
      let refreshed = 0;
      for (const w of s.written) if (await actions.rewrite(report, w.pair, region, w.placement, w.name)) refreshed += 1;
      return refreshNotice(before, s.reportRows, { refreshed, total: s.written.length });
    });
  };

  const detect = async (): Promise<void> => {
    s.notice = null;
    try {
      const region = await deps.port.regionAroundSelection();
      s.region = region;
      s.regionProblem = region ? null : 'Nothing is selected, or the selection is empty: click a cell inside your table of prices.';
    } catch (e) {
      s.region = null;
      s.regionProblem = e instanceof Error ? e.message : String(e);
    }
    if (s.region) s.choice = { ...s.choice, columns: defaultPick(describeColumns(s.region)) };
    unwatch?.();
    unwatch = null;
    prepare();
    render();
  };

  const actions = createActions(s, deps, { render, run, prepare, open, rewatch: async () => { unwatch?.(); unwatch = null; await ensureWatching(); }, detectAgain: () => void detect() });

  const onKey = (event: KeyboardEvent): void => {
    if (event.key === 'Escape' && !event.altKey && !event.ctrlKey && !event.metaKey) {
      if (s.running) {
        event.preventDefault();
        s.running.cancel();
      } else if (s.stability?.status === 'running') {
        event.preventDefault();
        actions.cancelStability();
      }
      return;
    }
    if (!event.altKey || (event.key !== 'ArrowRight' && event.key !== 'ArrowLeft')) return;
    const i = stepIndex(s.step) + (event.key === 'ArrowRight' ? 1 : -1);
    if (i < 0 || i >= STEPS.length) return;
    event.preventDefault();
    event.stopPropagation();
    open(STEPS[i].id);
  };
  // On the document, in the capture phase: focus may sit on the page itself after a redraw, and a
  // radio group or text field would otherwise take Alt+arrow as its own arrow key.
  const doc = root.ownerDocument;
  doc.addEventListener('keydown', onKey, true);
  render();
  void detect();
  return {
    state: () => s,
    detect,
    destroy() {
      doc.removeEventListener('keydown', onKey, true);
      unwatch?.();
      charts.forEach((c) => c.destroy());
      if (ticker) clearInterval(ticker);
    },
  };
}
