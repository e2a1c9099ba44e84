/**
 * The data step with a selection of two price histories on two calendars (Date A | GateGasoil |
 * Date B | DockDiesel): the second date column is never a series, the chosen series are joined
 * on the dates they share through the engine's join, the pane says how many rows each lost, and
 * the diagnosis runs on the joined rows. Expected values come from the other side of each check:
 * the shared dates and the rows lost are counted directly from the two calendars in the test,
 * and the joined analysis must equal the analysis of a one-calendar table holding only the
 * shared dates (agreement to 1e-12). Data: our own demo generator.
 */
import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { joinedRegionFor } from '../../taskpane/block/joined-region';
import { defaultPick, describeColumns } from '../../taskpane/ui/data/columns';
import { prepareData, type DataChoice } from '../../taskpane/ui/data/prepare-data';
import { dataStepView } from '../../taskpane/ui/views/data-view';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import type { DataRegion } from '../../taskpane/workbook/port';
import { demoRows, sharedDates, twoCalendarCsv, twoCalendars } from './two-calendars';

async function twoCalendarRegion(csv = twoCalendarCsv()): Promise<DataRegion> {
  const wb = loadCsvTable(csv);
  return wb.readTable!('QuennelPrices');
}

const choice = (columns: number[], patch: Partial<DataChoice> = {}): DataChoice => ({ columns, log: true, skipGaps: true, from: null, to: null, alpha: 0.05, ...patch });

describe('a selection of two price histories on two calendars', () => {
  it('offers the two prices and names the second date column as dates that join, not a series', async () => {
    const region = await twoCalendarRegion();
    const columns = describeColumns(region);
    expect(columns.map((c) => c.usable)).toEqual([false, true, false, true]);
    expect(columns[2].note).toMatch(/another date column: prices to its right are joined with the others on the dates they share/);
    expect(defaultPick(columns)).toEqual([1, 3]);
  });

  it('joins the two on the dates they share and says how many rows each lost', async () => {
    const region = await twoCalendarRegion();
    const p = prepareData(region, choice([1, 3]));
    const shared = sharedDates();
    const { a, b } = twoCalendars();
    expect(p.input.dates).toEqual(shared);
    expect(p.usedRows).toBe(shared.length);
    expect(p.names).toEqual(['GateGasoil', 'DockDiesel']);
    const notice = p.input.notices?.[0] ?? '';
    expect(notice).toContain(`share ${shared.length} dates, ${shared[0]} to ${shared[shared.length - 1]}`);
    expect(notice).toContain(`GateGasoil lost ${a.length - shared.length} of its rows`);
    expect(notice).toContain(`DockDiesel lost ${b.length - shared.length} of its rows`);
    // Each joined row holds the log prices of its own date.
    const byDate = new Map(demoRows().map((r) => [r.date, r]));
    shared.forEach((d, i) => {
      expect(p.input.series[0].values[i]).toBe(Math.log(byDate.get(d)!.gasoil));
      expect(p.input.series[1].values[i]).toBe(Math.log(byDate.get(d)!.diesel));
    });
    expect(p.firstUsed).toMatch(new RegExp(`^shared date ${shared[0]} \\(Prices rows? \\d+`));
    const view = dataStepView(region, describeColumns(region), [1, 3], p, null);
    expect(view.dateColumn).toMatch(/'Date A', 'Date B'.*joined on the dates they share/);
  });

  it('runs the diagnosis on the joined rows: the same report as a one-calendar table of the shared dates', async () => {
    const region = await twoCalendarRegion();
    const p = prepareData(region, choice([1, 3]));
    const joined = diagnose(p.input, { log: true, alpha: 0.05, window: p.window, preparation: p.prepText });
    const byDate = new Map(demoRows().map((r) => [r.date, r]));
    const oneCalendar = ['Date,GateGasoil,DockDiesel', ...sharedDates().map((d) => `${d},${byDate.get(d)!.gasoil},${byDate.get(d)!.diesel}`)].join('\n');
    const plain = await twoCalendarRegion(`${oneCalendar}\n`);
    const q = prepareData(plain, choice([1, 2]));
    const direct = diagnose(q.input, { log: true, alpha: 0.05, window: q.window, preparation: q.prepText });
    expect(joined.warnings[0]).toMatch(/^Joined on dates/);
    const pj = joined.pairs[0];
    const pd = direct.pairs[0];
    expect(pj.cointegration.engleGranger.aOnB.statistic).toBeCloseTo(pd.cointegration.engleGranger.aOnB.statistic as number, 12);
    expect(pj.relation?.ols.beta).toBe(pd.relation?.ols.beta);
    expect(pj.adjustment?.spreadAr1.halfLife).toBe(pd.adjustment?.spreadAr1.halfLife);
    expect(joined.series.map((s) => s.order)).toEqual(direct.series.map((s) => s.order));
    expect(joined.data.observations).toBe(sharedDates().length);
  });

  it('cuts a window by date among the joined rows', async () => {
    const region = await twoCalendarRegion();
    const p = prepareData(region, choice([1, 3], { from: '2023-01-02', to: '2023-12-29' }));
    const inside = sharedDates().filter((d) => d >= '2023-01-02' && d <= '2023-12-29');
    expect(p.usedRows).toBe(inside.length);
    expect(p.input.dates?.[p.window!.start]).toBe(inside[0]);
    expect(p.prepText).toMatch(/from row \d+, to row \d+/);
  });

  it('leaves one calendar alone: series under the same date column are not joined', async () => {
    const region = await twoCalendarRegion();
    expect(joinedRegionFor(region, ['GateGasoil'])).toBeNull();
    const p = prepareData(region, choice([1, 3]));
    expect(p.region.headers).toEqual(['Shared date', 'GateGasoil', 'DockDiesel']);
  });

  it('refuses a price column with no dates of its own, and dates that run shuffled, naming the row', async () => {
    const lines = twoCalendarCsv().trimEnd().split('\n');
    const withLeft = lines.map((l, i) => `${i === 0 ? 'Spot' : String(1 + i / 1000)},${l}`).join('\n');
    const left = await twoCalendarRegion(`${withLeft}\n`);
    expect(() => prepareData(left, choice([0, 4]))).toThrow(/'Spot' sits left of the first date column.*put each price column to the right of its dates/);
    const swapped = lines.slice();
    const f5 = swapped[5].split(',');
    const f9 = swapped[9].split(',');
    [f5[2], f9[2]] = [f9[2], f5[2]];
    swapped[5] = f5.join(',');
    swapped[9] = f9.join(',');
    const shuffled = await twoCalendarRegion(`${swapped.join('\n')}\n`);
    expect(() => prepareData(shuffled, choice([1, 3]))).toThrow(/Prices row \d+/);
  });
});
