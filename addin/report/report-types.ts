/**
 * The shape of the pairwise diagnostic: one structured report that every surface renders
 * (the pane, the command line's terminal, JSON and HTML output, the sheet block). It holds
 * plain objects, numbers, strings, booleans and null only, so it survives JSON.stringify, a
 * Web Worker message and a file round trip unchanged. Renderers only lay it out: every
 * number they show, chart points included, is computed here.
 *
 * The version field changes when a field is renamed or removed; added fields keep it.
 */
import type { NgPerronSummary } from './ng-perron-summary';
import type { Deterministic } from '../result';
import type { JohansenCase } from '../johansen/johansen';
import type { PairReport } from './pair-types';
import type { ScreeningCount } from './report-cautions';
import type { TestSummary } from './test-summary';
import type { HalfLifeUnit } from './row-period';

/** Version of the report's shape. */
export const DIAGNOSTIC_REPORT_VERSION = 1;

/** A row of the data: its position among the observations used, its label, its date. */
export interface RowPoint {
  /** 0-based position among the observations used. */
  position: number;
  /** The row as the source names it: "line 37 (2024-03-15)", "row 12". */
  label: string;
  date: string | null;
}

/** A row the cleaner dropped, and why. */
export interface DroppedRow {
  /** Series whose cell was dropped. */
  series: string;
  row: string;
  date: string | null;
  reason: string;
}

/** The data behind the report. */
export interface DataSection {
  /** Where the numbers came from (a file, a range), when known. */
  source: string | null;
  observations: number;
  first: RowPoint;
  last: RowPoint;
  /** Whether the values are natural logs (as the caller said). */
  logged: boolean;
  /** The window of the cleaned series used, 0-based, end exclusive; null when all of it. */
  window: { start: number; end: number } | null;
  /** What one row is, for sentences: "day", "week", "month", or "row" when unknown. */
  period: string;
  /** How the period word was found. */
  periodSource: string;
  /** The unit of every half-life, lag and window of the report: "days", "weeks", ... or "rows". */
  halfLifeUnit: HalfLifeUnit;
  /** The spacing of the dates found: "business days", "calendar days", "weeks", ...; "rows" without dates. */
  spacing: string;
  dropped: DroppedRow[];
  /** Label and date of every observation used, for tables and chart axes. */
  rowLabels: string[];
  dates: string[] | null;
}

/** One step of the order-of-integration decision: ADF and KPSS on levels, changes, ... */
export interface OrderStepSummary {
  /** 0 = levels, 1 = changes, 2 = changes of changes. */
  differences: number;
  adf: TestSummary;
  kpss: TestSummary;
  /** DF-GLS on the levels (differences 0 only; null on the differences, or with no deterministic terms). */
  gls: TestSummary | null;
  /** Ng-Perron (MZt heading MZa, MSB, MPT) on the same levels and terms as DF-GLS; shown for comparison, never decides (null where DF-GLS is). */
  ngPerron: NgPerronSummary | null;
}

/** One series' order of integration, with the tests behind it. */
export interface SeriesReport {
  name: string;
  /** 0, 1, 2, or 3 for "above 2". */
  order: number;
  /** "I(1)", "I(0)", "above I(2)". */
  orderText: string;
  /** Whether KPSS tells the same story as the test that decided. */
  agree: boolean;
  /** The unit-root test that decided the levels step ('adf' or 'dfgls'); the differences always take ADF. */
  decidedBy: 'adf' | 'dfgls';
  verdict: string;
  steps: OrderStepSummary[];
  warnings: string[];
  /** The series for a chart: rebased to 100 at the first row, or standardised when it cannot be rebased. */
  chart: { kind: 'rebased' | 'standardised'; values: number[] };
}

/** The Johansen rank test as the report carries it. */
export interface JohansenSummary {
  series: string[];
  case: JohansenCase;
  /** One sentence: why this deterministic case. */
  caseReason: string;
  /** Lagged changes K in the error-correction form. */
  lags: number;
  lagsReason: string;
  observations: number;
  eigenvalues: number[];
  trace: TestSummary[];
  maxEigen: TestSummary[];
  rank: { trace: number; maxEigen: number };
  verdict: string;
  warnings: string[];
}

/** The system of all series together (more than two series). */
export interface SystemReport {
  johansen: JohansenSummary | null;
  /** Why the system test is missing, when it is. */
  unavailable: string | null;
  verdict: string;
}

/** The choices the report was made with. */
export interface DiagnosticSettings {
  alpha: number;
  deterministic: Deterministic;
  lagRule: 'aic' | 'bic';
  /** The Johansen case asked for, or 'auto' when the report chooses per system. */
  johansenCase: JohansenCase | 'auto';
  /** Rows in the trailing window of the rolling z-score. */
  rollingWindow: number;
  /** How the prices were prepared before the diagnostic (addin/series/preparation.ts); '' when as given. */
  preparation: string;
  /** The unit-root test that decides whether each series' levels wander: 'adf' or 'dfgls'. */
  unitRootTest: 'adf' | 'dfgls';
}

/** A headline finding, in plain words, with the subject it is about. */
export interface Finding {
  /** "series", "pair" or "system". */
  about: 'series' | 'pair' | 'system';
  /** The names it concerns. */
  names: string[];
  text: string;
}

/** The full pairwise diagnostic. */
export interface DiagnosticReport {
  kind: 'mooring-pairwise-diagnostic';
  version: number;
  settings: DiagnosticSettings;
  data: DataSection;
  series: SeriesReport[];
  pairs: PairReport[];
  /** Present when more than two series were given. */
  system: SystemReport | null;
  /** The headline findings, in plain words, at the chosen level. */
  findings: Finding[];
  /** What the reader should weigh before relying on any finding (data, series); each pair has its own warnings too. */
  warnings: string[];
  /** The standing cautions: evidence, not advice; relations break; screening; your own policy. */
  cautions: string[];
  /** How many tests ran and how many would pass by chance alone. */
  screening: ScreeningCount;
}
