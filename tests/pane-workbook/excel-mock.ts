/**
 * A mock Excel for the Office adapter tests, built on office-addin-mock: each Excel.run gets
 * a context that is an OfficeMockObject, and every range, named item, table and chart looked
 * up through it is an OfficeMockObject too, so a property read before load() and sync()
 * gives the library's "not loaded" text instead of data (a missing sync shows up as a wrong
 * answer). Writes are queued and applied at sync; a sync can be made to fail
 * after applying only part of its batch, as a real batch can. Counts runs and syncs per run.
 */
import { OfficeMockObject } from 'office-addin-mock';
import { columnLetters, parseRange, rangeAddress, overlaps, type CellRange } from '../../taskpane/workbook/a1-address';
import { MockStore, type MockCell } from './excel-mock-store';

type Op = { what: string; apply: () => void };
type Handler = { kind: 'table' | 'sheet'; target: string; fn: (args: unknown) => Promise<void>; removed: boolean };

/** The mock Excel and Office globals over a MockStore. */
export class MockExcel {
  readonly store: MockStore;
  /** Syncs made in each Excel.run, in order. */
  readonly syncsPerRun: number[] = [];
  readonly handlers: Handler[] = [];
  /** Highest ExcelApi version the mock host supports. */
  apiVersion = 1.9;
  /** Syncs that fail, by "run:sync" (1-based), with how many queued writes they apply first. */
  readonly failures = new Map<string, number>();

  constructor(sheets: string[] = ['Prices']) {
    this.store = new MockStore(sheets);
  }

  /** Puts Excel and Office on globalThis; returns a function that takes them away. */
  install(): () => void {
    const g = globalThis as Record<string, unknown>;
    g.Excel = {
      // Excel.run(batch) gets a new context; Excel.run(context, batch) reuses the one given.
      run: (a: unknown, b?: unknown) =>
        typeof a === 'function' ? this.run(a as (c: unknown) => Promise<unknown>) : (b as (c: unknown) => Promise<unknown>)(a),
      ChartType: { line: 'Line' },
      ChartSeriesBy: { columns: 'Columns' },
      ConditionalFormatType: { containsText: 'ContainsText' },
      ConditionalTextOperator: { beginsWith: 'BeginsWith' },
      ClearApplyTo: { contents: 'Contents', formats: 'Formats', all: 'All' },
    };
    g.Office = { context: { requirements: { isSetSupported: (set: string, v: string) => set === 'ExcelApi' && Number(v) <= this.apiVersion } } };
    return () => {
      delete g.Excel;
      delete g.Office;
    };
  }

  /** Calls the live handlers of a table or sheet, as Excel would on a change. */
  async fire(kind: 'table' | 'sheet', target: string, args: unknown): Promise<void> {
    for (const h of this.handlers.filter((x) => x.kind === kind && x.target === target && !x.removed)) await h.fn(args);
  }

  private async run(batch: (context: unknown) => Promise<unknown>): Promise<unknown> {
    const run = this.syncsPerRun.length;
    this.syncsPerRun.push(0);
    return batch(new MockContext(this, run).context);
  }
}

/** One Excel.run's request context. */
class MockContext {
  readonly context: OfficeMockObject;
  private readonly ops: Op[] = [];
  private readonly loaded: OfficeMockObject[] = [];
  private readonly writes: (() => Op[])[] = [];
  private readonly afterSync: (() => void)[] = [];
  private synced = 0;
  private readonly where = new WeakMap<object, { sheet: string; range: CellRange }>();

  constructor(private readonly excel: MockExcel, private readonly run: number) {
    const s = excel.store;
    this.context = new OfficeMockObject({
      workbook: {
        getSelectedRange: () => this.range(s.selection.sheet, s.selection.address),
        worksheets: this.collection(() => [...s.sheets.keys()].map((name) => ({ name })), {
          getItem: (name: string) => this.sheet(name),
          add: (name: string) => this.queue(`worksheets.add(${name})`, () => s.sheets.set(name, new Map())),
        }),
        tables: this.collection(() => s.tables.map((t) => this.table(t.name)), {
          getItem: (name: string) => this.table(name),
          getItemOrNullObject: (name: string) => this.table(name),
        }),
        names: this.collection(() => s.names.map((n) => ({ name: n.name })), {
          add: (name: string, ref: object, comment?: string) => {
            const at = this.where.get(ref)!;
            this.queue(`names.add(${name},${rangeAddress(at.range)})`, () => s.names.push({ name, sheet: at.sheet, address: rangeAddress(at.range), comment: comment ?? '' }));
          },
          getItemOrNullObject: (name: string) => this.namedItem(name),
        }),
      },
      sync: () => this.sync(),
    });
  }

  private queue(what: string, apply: () => void): void {
    this.excel.store.calls.push(what);
    this.ops.push({ what, apply });
  }

  private collection(items: () => object[], methods: Record<string, unknown>): Record<string, unknown> {
    const c: Record<string, unknown> = {
      ...methods,
      load: () => {
        // Items are made (and their names loaded) now, so the sync makes them readable.
        const list = items();
        this.afterSync.push(() => {
          c.items = list;
        });
        return c;
      },
    };
    return c;
  }

  private track<T extends OfficeMockObject>(m: T, isNull: boolean | null = null): T {
    this.loaded.push(m);
    if (isNull !== null) {
      const madeAt = this.synced;
      Object.defineProperty(m, 'isNullObject', {
        get: () => {
          if (this.synced === madeAt) throw new Error('isNullObject read before context.sync()');
          return isNull;
        },
      });
    }
    return m;
  }

  private async sync(): Promise<void> {
    const n = ++this.excel.syncsPerRun[this.run];
    // Property writes first (in the order the ranges were made), then queued calls: a partial
    // failure can then leave formulas written and formats not, as the failure tests need.
    const batch = [...this.writes.flatMap((w) => w()), ...this.ops.splice(0)];
    const limit = this.excel.failures.get(`${this.run + 1}:${n}`);
    batch.slice(0, limit ?? batch.length).forEach((op) => op.apply());
    if (limit !== undefined) throw new Error('InvalidArgument: the mock workbook refused part of this batch');
    await Promise.all(this.loaded.map((m) => OfficeMockObject.prototype.sync.call(m)));
    this.synced++;
    for (const f of this.afterSync.splice(0)) f();
  }

  private sheet(name: string): Record<string, unknown> {
    const s = this.excel.store;
    s.sheet(name);
    return {
      name,
      getRange: (address: string) => this.range(name, address),
      tables: {
        add: (address: string, hasHeaders: boolean) => {
          const t: Record<string, unknown> = { name: '' };
          this.queue(`tables.add(${name}!${address},${hasHeaders})`, () => s.tables.push({ name: String(t.name), sheet: name, address }));
          return t;
        },
      },
      charts: {
        add: (type: string, source: object, by: string) => this.chart(name, type, source, by),
        getItemOrNullObject: (chartName: string) => {
          const i = s.charts.findIndex((c) => c.sheet === name && c.name === chartName);
          const m = new OfficeMockObject({ name: chartName, delete: () => this.queue(`charts.delete(${chartName})`, () => s.charts.splice(s.charts.findIndex((c) => c.name === chartName), 1)) });
          return this.track(m, i < 0);
        },
      },
      onChanged: { add: (fn: Handler['fn']) => this.handler('sheet', name, fn) },
    };
  }

  private handler(kind: Handler['kind'], target: string, fn: Handler['fn']) {
    const h: Handler = { kind, target, fn, removed: false };
    this.queue(`${kind}.onChanged.add(${target})`, () => this.excel.handlers.push(h));
    return { context: this.context, remove: () => this.queue(`${kind}.onChanged.remove(${target})`, () => (h.removed = true)) };
  }

  private table(name: string): OfficeMockObject {
    const t = this.excel.store.tables.find((x) => x.name.toLowerCase() === name.toLowerCase());
    const m = new OfficeMockObject({
      name: t?.name ?? name,
      getRange: () => this.range(t!.sheet, t!.address),
      onChanged: { add: (fn: Handler['fn']) => this.handler('table', t!.name, fn) },
    });
    m.load('name');
    return this.track(m, !t);
  }

  private namedItem(name: string): OfficeMockObject {
    const s = this.excel.store;
    const n = s.names.find((x) => x.name.toLowerCase() === name.toLowerCase());
    const m = new OfficeMockObject({
      name,
      comment: n?.comment ?? '',
      delete: () => this.queue(`names.delete(${name})`, () => s.names.splice(s.names.indexOf(n!), 1)),
      getRangeOrNullObject: () => (n ? this.range(n.sheet, n.address) : this.track(new OfficeMockObject({ address: '' }), true)),
    });
    return this.track(m, !n);
  }

  private chart(sheet: string, type: string, source: object, seriesBy: string): Record<string, unknown> {
    const at = this.where.get(source)!;
    const first = { name: '', values: rangeAddress(at.range), x: null as string | null };
    const series = [first];
    const seriesApi = (s: typeof first) => ({
      set name(v: string) { s.name = v; },
      setValues: (r: object) => { s.values = rangeAddress(this.where.get(r)!.range); },
      setXAxisValues: (r: object) => { s.x = rangeAddress(this.where.get(r)!.range); },
    });
    const chart = {
      name: '',
      title: { text: '' },
      position: null as string | null,
      series: {
        getItemAt: (i: number) => seriesApi(series[i]),
        add: (name: string) => {
          const s = { name, values: '', x: null as string | null };
          series.push(s);
          return seriesApi(s);
        },
      },
      setPosition: (anchor: string) => { chart.position = anchor; },
    };
    this.queue(`charts.add(${type},${rangeAddress(at.range)},${seriesBy})`, () =>
      this.excel.store.charts.push({ sheet, name: chart.name, type, source: rangeAddress(at.range), seriesBy, title: chart.title.text, series, position: chart.position }));
    return chart;
  }

  /** A range: its data readable after load and sync; its writes applied at sync. */
  private range(sheet: string, address: string): OfficeMockObject {
    const s = this.excel.store;
    const r = parseRange(address);
    const initial = { formulas: s.formulas(sheet, r) as unknown, numberFormat: s.numberFormats(sheet, r) as unknown };
    const cells = (f: (c: MockCell) => void) => { for (let row = r.top; row <= r.bottom; row++) for (let col = r.left; col <= r.right; col++) s.edit(sheet, row, col, f); };
    const label = `${sheet}!${rangeAddress(r)}`;
    const m: OfficeMockObject = new OfficeMockObject({
      address: `${sheet}!${rangeAddress(r)}`,
      values: s.values(sheet, r),
      formulas: initial.formulas,
      numberFormat: initial.numberFormat,
      worksheet: { name: sheet },
      format: { font: {}, fill: { clear: () => this.queue(`fill.clear(${label})`, () => cells((c) => delete c.fill)) } },
      conditionalFormats: {
        clearAll: () => this.queue(`conditionalFormats.clearAll(${label})`, () => cells((c) => (c.textFills = []))),
        add: (type: string) => {
          const cf = { textComparison: { format: { fill: { color: '' } }, rule: { operator: '', text: '' } } };
          this.queue(`conditionalFormats.add(${type},${label})`, () => cells((c) => c.textFills.push({ startsWith: cf.textComparison.rule.text, fill: cf.textComparison.format.fill.color })));
          return cf;
        },
      },
      getCell: (i: number, j: number) => this.range(sheet, rangeAddress({ top: r.top + i, bottom: r.top + i, left: r.left + j, right: r.left + j })),
      getColumn: (j: number) => this.range(sheet, rangeAddress({ ...r, left: r.left + j, right: r.left + j })),
      getTables: () => this.collection(() => s.tables.filter((t) => t.sheet === sheet && overlaps(parseRange(t.address), r)).map((t) => this.table(t.name)), {}),
      getSurroundingRegion: () => this.range(sheet, s.surrounding(sheet, r)),
      clear: (applyTo: string) => this.queue(`clear(${applyTo},${label})`, () => cells((c) => { c.formula = ''; if (applyTo !== 'Contents') { c.numberFormat = 'General'; c.textFills = []; delete c.bold; delete c.fill; } })),
      getCellProperties: () => {
        const result: { value: unknown } = { value: 'Error, context.sync() was not called' };
        this.afterSync.push(() => { result.value = s.grid(r, (row, col) => ({ format: { ...pick(s.cell(sheet, row, col)) } })); });
        return result;
      },
      setCellProperties: (grid: { format: Partial<MockCell> }[][]) => this.queue(`setCellProperties(${label})`, () =>
        grid.forEach((line, i) => line.forEach((p, j) => s.edit(sheet, r.top + i, r.left + j, (c) => { delete c.bold; delete c.italic; delete c.fill; Object.assign(c, p.format); })))),
    });
    this.where.set(m, { sheet, range: r });
    this.track(m);
    this.writes.push(() => {
      const out: Op[] = [];
      const grid = (key: 'formulas' | 'numberFormat', f: (c: MockCell, v: unknown) => void) => {
        const v = m[key];
        if (!Array.isArray(v) || v === initial[key]) return;
        initial[key] = v;
        out.push({ what: `${key}(${label})`, apply: () => v.forEach((line: unknown[], i: number) => line.forEach((x, j) => s.edit(sheet, r.top + i, r.left + j, (c) => f(c, x)))) });
      };
      grid('numberFormat', (c, v) => (c.numberFormat = String(v)));
      grid('formulas', (c, v) => (c.formula = v as MockCell['formula']));
      const font = m.format.font as Record<string, unknown>;
      const fill = m.format.fill as Record<string, unknown>;
      const format = m.format as Record<string, unknown>;
      const props: [Record<string, unknown>, string, keyof MockCell][] = [[font, 'bold', 'bold'], [font, 'italic', 'italic'], [font, 'color', 'fontColor'], [font, 'size', 'size'], [fill, 'color', 'fill'], [format, 'wrapText', 'wrap']];
      for (const [obj, key, field] of props) {
        if (typeof obj[key] !== 'boolean' && typeof obj[key] !== 'string' && typeof obj[key] !== 'number') continue;
        const v = obj[key];
        delete obj[key];
        out.push({ what: `format.${key}(${label})`, apply: () => cells((c) => ((c as unknown as Record<string, unknown>)[field] = v)) });
      }
      if (typeof format.columnWidth === 'number') {
        const w = format.columnWidth;
        delete format.columnWidth;
        out.push({ what: `columnWidth(${label})`, apply: () => s.columnWidths.set(columnLetters(r.left), w) });
      }
      return out;
    });
    return m;
  }
}

function pick(c: MockCell | undefined): Partial<MockCell> {
  if (!c) return {};
  const out: Partial<MockCell> = {};
  if (c.bold !== undefined) out.bold = c.bold;
  if (c.italic !== undefined) out.italic = c.italic;
  if (c.fill !== undefined) out.fill = c.fill;
  return out;
}
