import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { demoRowsAfter } from '../../addin/demo/continuation';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { showNumber } from '../../taskpane/ui/views/numbers';
import { openPreview, shot, type PreviewSession } from './browser';

// The preview as a user sees it in a wide window: the pane at 340 px and the in-memory
// workbook beside it as a sheet. Through the pane's controls and the sheet (clicks and keys):
// a cell blanked to make a gap, logs on, a From date typed, the diagnosis run and the block
// written; then every number the block shows is compared with the pane's own (the report the
// pane holds, 1e-12 relative, and the rounded numbers its steps print); then the sheet's
// "append rows" control adds the demo's next 12 days and the comparison runs again on the
// refreshed pane and block. Expected values come from the other surface (agreement is the
// check), the committed demo CSV and the demo's own continuation (addin/demo); all invented.
// Last, two price histories on two calendars in a sheet of their own: joined on their dates by
// the pane and by the block's MOOR.COMMONDATES formula, with DF-GLS chosen to decide the orders.
// Screenshots go to test-artifacts/e2e/sheet-*.png.

let session: PreviewSession;
let page: Page;

const DEMO_CSV = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trimEnd().split('\n');
const BLOCK = 'Mooring_GateGasoil_DockDiesel';
const GAP = 'C700'; // DockDiesel, inside the window below
const FROM = '2023-06-01';

/** One number row of the block: its label, the cell holding the number, what the cell shows and the sheet's text for it. */
interface BlockNumber {
  label: string;
  cell: string;
  value: number;
}

/** The report the pane holds (its steps render from it), through the preview's test hook. */
const paneReport = () => page.evaluate(() => window.__mooringPane!.state().report as unknown) as Promise<DiagnosticReport>;

/** Every number the block shows in its value column, read from the in-memory workbook. */
async function blockNumbers(block = BLOCK): Promise<{ sheet: string; numbers: BlockNumber[] }> {
  return page.evaluate(async (name) => {
    const wb = window.__mooringWorkbook!;
    const found = await wb.findBlock(name);
    if (!found) throw new Error(`no block named ${name}`);
    const m = /^([A-Z]+)(\d+):([A-Z]+)(\d+)$/.exec(found.address)!;
    const letter = (s: string) => [...s].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
    const col = (n: number) => { let s = ''; for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s; return s; };
    const labelCol = m[1];
    const valueCol = col(letter(m[1]) + 1);
    const numbers: { label: string; cell: string; value: number }[] = [];
    // The block's own rows: the spilled chart columns to the right are not its labelled numbers.
    for (let r = Number(m[2]); r <= Number(m[4]); r++) {
      const label = wb.shownValue(found.sheet, `${labelCol}${r}`);
      const value = wb.shownValue(found.sheet, `${valueCol}${r}`);
      if (typeof label === 'string' && typeof value === 'number') numbers.push({ label, cell: `${valueCol}${r}`, value });
    }
    return { sheet: found.sheet, numbers };
  }, block);
}

/** What the pane says for each labelled number of the block (label prefix -> number), from its report. */
function paneNumbers(report: DiagnosticReport, tableRows: number): Record<string, number | null> {
  const p = report.pairs.find((q) => [q.a, q.b].sort().join() === 'DockDiesel,GateGasoil');
  if (!p || !p.relation || !p.adjustment || !p.spread || !p.leadLag) throw new Error('the demo pair should have its relation, adjustment, spread and lead-lag');
  const order = (name: string) => report.series.find((s) => s.name === name)?.order ?? null;
  const eg = p.cointegration.engleGranger;
  const j = p.cointegration.johansen;
  const out: Record<string, number | null> = {
    'Rows in the data now': tableRows,
    'Level of every reading': report.settings.alpha,
    [`Does ${p.a} wander?`]: order(p.a),
    [`Does ${p.b} wander?`]: order(p.b),
    [`Tied? Engle-Granger, ${eg.aOnB.dependent} on ${eg.aOnB.regressor}`]: eg.aOnB.pValue,
    [`Tied? Engle-Granger, ${eg.bOnA.dependent} on ${eg.bOnA.regressor}`]: eg.bOnA.pValue,
    'Tied? Phillips-Ouliaris': p.cointegration.phillipsOuliaris?.pValue ?? null,
    'Tied? Johansen': j?.trace[0].pValue ?? null,
    'Long-run relations found by Johansen': j?.rank.trace ?? null,
    [`Does ${p.adjustment.ecm.dependent.series} move back?`]: p.adjustment.ecm.dependent.speed,
    'Is that pull significant?': p.adjustment.ecm.dependent.speed / p.adjustment.ecm.dependent.standardError,
    'Does the spread revert? Half-life': p.adjustment.spreadAr1.halfLife,
    'Half-life, low end of its 95% interval': p.adjustment.spreadAr1.halfLifeInterval.low,
    'Half-life, high end of its 95% interval': p.adjustment.spreadAr1.halfLifeInterval.high,
    'Is the spread stretched now?': p.spread.latestZ,
    [`Does ${p.leadLag.aLeadsB.cause} lead`]: p.leadLag.aLeadsB.test.pValue,
    [`Does ${p.leadLag.bLeadsA.cause} lead`]: p.leadLag.bLeadsA.test.pValue,
  };
  const r = p.cointegration.restrictions;
  if (r) {
    out[`Is the relation simply ${p.a} minus ${p.b}?`] = r.oneToOne.pValue;
    for (const t of r.adjusts) out[`Does ${t.series} move to close the gap?`] = t.pValue;
  }
  if (p.movingHedge) out['Elasticity now, allowed to move'] = p.movingHedge.latest.beta;
  if (p.forecast) out['Where the spread is heading'] = p.forecast.spread.path[p.forecast.horizon - 1];
  expect(report.data.logged, 'the run was made with logs on').toBe(true);
  out['Elasticity of'] = p.relation.ols.beta;
  out['Elasticity (dynamic OLS)'] = p.relation.dynamicOls.beta;
  out['Hedge at the latest prices'] = p.relation.dynamicOls.hedgeUnits; // the pane's "units to hold" is the dynamic-OLS one too
  return out;
}

/** Checks every number of the block against the pane's report (1e-12 relative); every block number must be matched. */
async function expectBlockMatchesReport(tableRows: number, block = BLOCK): Promise<BlockNumber[]> {
  const { numbers } = await blockNumbers(block);
  const report = await paneReport();
  const pane = paneNumbers(report, tableRows);
  const unmatched = numbers.filter((n) => !Object.keys(pane).some((label) => n.label.startsWith(label)));
  expect(unmatched.map((n) => `${n.cell} ${n.label}`), 'every number in the block has its number in the pane').toEqual([]);
  for (const [label, expected] of Object.entries(pane)) {
    const row = numbers.find((n) => n.label.startsWith(label));
    if (expected === null) {
      expect(row, `${label}: the pane has no number, so neither may the block`).toBeUndefined();
      continue;
    }
    expect(row, `${label}: the block shows no number`).toBeDefined();
    const rel = Math.abs(row!.value - expected) / Math.max(Math.abs(expected), 1e-300);
    expect(rel, `${label}: block ${row!.value} vs pane ${expected}`).toBeLessThan(1e-12);
  }
  return numbers;
}

/** A pane number as printed ("0.0066"), or null for a bound ("< 0.0001") or text. */
function printed(text: string | null | undefined): { value: number; halfStep: number } | null {
  const t = (text ?? '').trim();
  const m = /^-?\d+(?:\.(\d+))?/.exec(t);
  if (!m || /^[<>]/.test(t)) return null;
  return { value: Number(m[0]), halfStep: 0.5 * 10 ** -(m[1]?.length ?? 0) };
}

/** The pane's printed numbers (steps 3 and 4) agree with the block's to the digits printed. */
async function expectPrintedNumbersMatch(numbers: BlockNumber[]): Promise<void> {
  const block = (label: string) => numbers.find((n) => n.label.startsWith(label))!.value;
  await page.locator('[data-step="tied"]').click();
  const tests = await page.locator('table.tests tbody tr').evaluateAll((rows) => rows.map((r) => [r.querySelector('th')?.textContent ?? '', r.querySelectorAll('td')[1]?.textContent ?? '']));
  let compared = 0;
  for (const [what, p] of tests) {
    const eg = /^Engle-Granger, (\w+) on (\w+)$/.exec(what);
    const shown = printed(p);
    if (!eg || !shown) continue;
    expect(Math.abs(block(`Tied? Engle-Granger, ${eg[1]} on ${eg[2]}`) - shown.value), `${what}: pane prints ${p}`).toBeLessThanOrEqual(shown.halfStep + 1e-12);
    compared += 1;
  }
  expect(compared, 'the pane prints both Engle-Granger p-values').toBe(2);
  await page.locator('[data-step="relation"]').click();
  const facts = await page.locator('dl.facts dt').evaluateAll((dts) => dts.map((dt) => [dt.textContent ?? '', dt.nextElementSibling?.textContent ?? '']));
  const fact = (start: string) => facts.find(([label]) => label.startsWith(start))?.[1];
  const checks: [string, string][] = [
    ['Elasticity, plain least squares', 'Elasticity of'],
    ['Elasticity, dynamic least squares', 'Elasticity (dynamic OLS)'],
    ['Spread (plain least-squares line) on', 'Is the spread stretched now?'],
    ['Units of GateGasoil to hold per unit of DockDiesel', 'Hedge at the latest prices'],
  ];
  for (const [paneLabel, blockLabel] of checks) {
    const shown = printed(fact(paneLabel));
    expect(shown, `the pane prints '${paneLabel}'`).not.toBeNull();
    expect(Math.abs(block(blockLabel) - shown!.value), `${paneLabel}: pane prints ${fact(paneLabel)}`).toBeLessThanOrEqual(shown!.halfStep + 1e-12);
  }
}

const cellText = (address: string) => page.locator(`#sheet td[data-cell="${address}"]`).textContent();

beforeAll(async () => {
  session = await openPreview();
  page = session.page;
  await page.setViewportSize({ width: 1280, height: 860 });
  await page.waitForSelector('[data-role="found"]');
});

afterAll(async () => {
  await session?.close();
});

describe('the preview shows the sheet, and the block it gets matches the pane', () => {
  it('shows the demo table beside a 340 px pane, using the rest of the window, and a clicked cell in the bar', async () => {
    const pane = await page.locator('.pane-frame').boundingBox();
    const sheet = await page.locator('#sheet').boundingBox();
    expect(Math.round(pane!.width)).toBe(340);
    expect(sheet!.x).toBeGreaterThanOrEqual(pane!.x + pane!.width - 1);
    expect(sheet!.x + sheet!.width).toBeGreaterThan(1280 - 2);
    // Header and first rows as the committed demo file has them.
    const header = DEMO_CSV[0].split(',');
    const first = DEMO_CSV[1].split(',');
    for (const [j, col] of ['A', 'B', 'C', 'D', 'E', 'F', 'G'].entries()) {
      expect(await cellText(`${col}1`)).toBe(header[j]);
      if (j === 0) expect(await cellText('A2')).toBe(first[0]);
      else expect(Number(await cellText(`${col}2`))).toBe(Number(first[j]));
    }
    expect(await cellText('A781')).toBe(DEMO_CSV[780].split(',')[0]);
    expect(await page.locator('#sheet [data-sheet]').allTextContents()).toEqual(['Prices']);
    await page.locator('#sheet td[data-cell="D3"]').click();
    expect(await page.locator('[data-role="sheet-address"]').textContent()).toBe('D3');
    expect(Number(await page.locator('[data-role="formula-bar"]').textContent())).toBe(Number(DEMO_CSV[2].split(',')[3]));
    await shot(page, 'sheet-01-table');
  });

  it('blanks a cell by Delete, and the pane, told to use the data around that cell, lists the gap', async () => {
    await page.locator(`#sheet td[data-cell="${GAP}"]`).click();
    const before = await page.evaluate((a) => window.__mooringWorkbook!.shownValue('Prices', a), GAP);
    expect(typeof before).toBe('number');
    await page.keyboard.press('Delete');
    await expect.poll(() => page.evaluate((a) => window.__mooringWorkbook!.shownValue('Prices', a), GAP)).toBeNull();
    await expect.poll(() => cellText(GAP)).toBe('');
    await page.locator('[data-role="detect"]').click();
    await page.waitForSelector('[data-role="dropped"]');
    expect(await page.locator('[data-role="dropped"]').textContent()).toContain('700');
  });

  it('runs with logs on and a typed From date, and writes the block beside the data', async () => {
    const log = page.locator('[data-role="log"]');
    if (!(await log.evaluate((e) => (e as unknown as { checked: boolean }).checked))) await log.click();
    expect(await log.evaluate((e) => (e as unknown as { checked: boolean }).checked)).toBe(true);
    expect(await page.locator('[data-role="gaps"]').evaluate((e) => (e as unknown as { checked: boolean }).checked)).toBe(true);
    await page.locator('fluent-text-input[data-role="from"] input').fill(FROM);
    await page.keyboard.press('Tab');
    await expect.poll(() => page.locator('[data-role="rows-used"]').textContent()).toContain(FROM);
    await shot(page, 'sheet-02-choices');
    await page.locator('[data-role="run"]').click();
    await page.waitForSelector('[data-series="DockDiesel"]', { timeout: 60_000 });
    const report = await paneReport();
    expect(report.data.logged).toBe(true);
    expect(report.settings.preparation).toMatch(/log/);
    expect(report.settings.preparation).toMatch(/skip gaps/);
    expect(report.settings.preparation).toMatch(/from row/);

    await page.locator('[data-step="write"]').click();
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="written"]', { timeout: 60_000 });
    // The sheet shows the block: its title and its prepared-as cell, as the workbook holds them.
    const { sheet, numbers } = await blockNumbers();
    expect(sheet).toBe('Prices');
    const title = await page.evaluate(() => window.__mooringWorkbook!.shownValue('Prices', 'I1'));
    expect(await cellText('I1')).toBe(title);
    const eg = numbers.find((n) => n.label.startsWith('Tied? Engle-Granger'))!;
    await expect.poll(() => cellText(eg.cell)).toBe(eg.value.toFixed(4));
  });

  it('the block shows the pane\'s numbers: the report exactly, the steps to the digits they print', async () => {
    const numbers = await expectBlockMatchesReport(780);
    expect(numbers.length).toBeGreaterThanOrEqual(15);
    await expectPrintedNumbersMatch(numbers);
  });

  it('clicking a block cell shows its live formula in the bar, a spilled cell names its source, and the chart is drawn', async () => {
    const { numbers } = await blockNumbers();
    const eg = numbers.find((n) => n.label.startsWith('Tied? Engle-Granger'))!;
    await page.locator(`#sheet td[data-cell="${eg.cell}"]`).click();
    const bar = await page.locator('[data-role="formula-bar"]').textContent();
    expect(bar).toMatch(/^=MOOR\.ENGLEGRANGER\(QuennelPrices\[\w+\],QuennelPrices\[\w+\],.*\$J\$\d+\)$/);
    const prepRow = numbers.length > 0 ? await page.evaluate(() => {
      const wb = window.__mooringWorkbook!;
      for (let r = 1; r < 40; r++) if (wb.shownValue('Prices', `I${r}`) === 'Prices prepared as') return r;
      return 0;
    }) : 0;
    expect(bar).toContain(`$J$${prepRow}`);
    expect(await cellText(`J${prepRow}`)).toMatch(/^log, skip gaps, from row \d+/);
    const chart = page.locator(`#sheet [data-chart="${BLOCK}"]`);
    expect(await chart.locator('path[data-series="Spread"]').count()).toBe(1);
    expect((await chart.locator('path[data-series="Spread"]').getAttribute('d'))!.length).toBeGreaterThan(1000);
    // A cell inside the spread's spill, well below the block's own rows.
    const spill = await page.evaluate(() => {
      const wb = window.__mooringWorkbook!;
      for (const c of 'NOPQRSTU') if (String(wb.cellAt('Prices', `${c}3`).stored?.formula ?? '').startsWith('=MOOR.SPREAD(')) return c;
      return null;
    });
    expect(spill).not.toBeNull();
    await page.locator(`#sheet td[data-cell="${spill}60"]`).click();
    expect(await page.locator('[data-role="formula-bar"]').textContent()).toMatch(new RegExp(`^=MOOR\\.SPREAD\\(.*\\(spilled from ${spill}3\\)$`));
    await chart.scrollIntoViewIfNeeded();
    await shot(page, 'sheet-03-block-and-chart');
  });

  it('"append rows" adds the demo\'s next 12 days; the pane and the block refresh and still agree', async () => {
    const before = await blockNumbers();
    const next = demoRowsAfter(0, 12);
    expect(await page.locator('[data-role="append-count"]').inputValue()).toBe('12');
    await page.locator('[data-role="append-rows"]').click();
    expect(await page.locator('[data-role="append-status"]').textContent()).toContain(`${next.dates[0]} to ${next.dates[11]}`);
    await page.waitForSelector('[data-role="notice"]', { timeout: 60_000 });
    expect(await page.locator('[data-role="notice"]').textContent()).toBe('12 new rows since the last run: results updated. The block in the sheet was refreshed too.');
    // The table grew in the sheet, with the continued scenario's rows.
    expect(await cellText('A793')).toBe(next.dates[11]);
    expect(Number(await cellText('B793'))).toBe(next.columns.GateGasoil[11]);
    expect(await page.locator('#sheet tr.fresh').count()).toBe(12);
    await shot(page, 'sheet-04-appended');
    // The block, live: 792 rows, every number equal to the refreshed pane's.
    const numbers = await expectBlockMatchesReport(792);
    const rowsCell = numbers.find((n) => n.label.startsWith('Rows in the data now'))!;
    await expect.poll(() => cellText(rowsCell.cell)).toBe('792');
    const moved = numbers.filter((n) => before.numbers.find((b) => b.label === n.label)?.value !== n.value);
    expect(moved.length, 'the new rows move the block\'s numbers').toBeGreaterThan(3);
    await expectPrintedNumbersMatch(numbers);
    await page.locator(`#sheet [data-chart="${BLOCK}"]`).scrollIntoViewIfNeeded();
    await shot(page, 'sheet-05-refreshed-block');
  });

  it('a block written on a new sheet opens that sheet\'s tab; the first tab still holds the table', async () => {
    await page.locator('[data-step="write"]').click();
    await page.locator('fluent-radio[value="new-sheet"]').click();
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="written"]', { timeout: 60_000 });
    await expect.poll(() => page.locator('#sheet [data-sheet]').count()).toBe(2);
    const tabs = await page.locator('#sheet [data-sheet]').allTextContents();
    expect(tabs[0]).toBe('Prices');
    await expect.poll(() => page.locator('#sheet [data-sheet][aria-selected="true"]').textContent()).toBe(tabs[1]);
    const title = await page.evaluate((sheet) => {
      const wb = window.__mooringWorkbook!;
      for (let r = 1; r <= 5; r++) for (const c of 'ABCDEF') {
        const v = wb.shownValue(sheet, `${c}${r}`);
        if (typeof v === 'string' && v.startsWith('GateGasoil and DockDiesel')) return { cell: `${c}${r}`, text: v };
      }
      return null;
    }, tabs[1]);
    expect(title).not.toBeNull();
    expect(await cellText(title!.cell)).toBe(title!.text);
    await shot(page, 'sheet-06-new-sheet-tab');
    await page.locator('#sheet [data-sheet="Prices"]').click();
    expect(await cellText('A1')).toBe('Date');
  });

  it('two price histories on two calendars: the pane joins them on their dates, DF-GLS decides the orders, and the block (joined by MOOR.COMMONDATES) shows the pane\'s numbers', async () => {
    // The demo's GateGasoil without every 7th date, its DockDiesel without every 11th, side by side.
    const rows = DEMO_CSV.slice(1).map((l) => l.split(','));
    const a = rows.filter((_, i) => i % 7 !== 3).map((f) => [f[0], Number(f[1])]);
    const b = rows.filter((_, i) => i % 11 !== 5).map((f) => [f[0], Number(f[2])]);
    const inB = new Set(b.map((r) => r[0]));
    const shared = a.filter((r) => inB.has(r[0])).length;
    const grid: (string | number | null)[][] = [['Date A', 'GateGasoil', 'Date B', 'DockDiesel']];
    const height = Math.max(a.length, b.length);
    for (let i = 0; i < height; i++) grid.push([...(a[i] ?? [null, null]), ...(b[i] ?? [null, null])] as (string | number | null)[]);
    await page.evaluate((cells) => {
      const wb = window.__mooringWorkbook!;
      void wb.addSheet('Two');
      wb.setValues('Two', 'A1', cells);
      wb.select('Two', 'B2');
    }, grid);
    await page.locator('[data-step="data"]').click();
    await page.locator('[data-role="detect"]').click();
    await page.waitForSelector('[data-role="found"]:has-text("Two")');
    // The From date typed for the demo table stays in the field: clear it to use every shared date.
    await page.locator('fluent-text-input[data-role="from"] input').fill('');
    await page.keyboard.press('Tab');
    await expect.poll(() => page.locator('[data-role="rows-used"]').textContent()).toContain(`${shared} of ${shared} rows used, shared date`);
    await shot(page, 'sheet-07-two-calendars');
    await page.locator('[data-role="run"]').click();
    await page.waitForSelector('[data-series="DockDiesel"], [data-role="run-problem"]', { timeout: 60_000 });
    await shot(page, 'sheet-07b-two-calendars-run');
    expect(await page.locator('[data-role="run-problem"]').count(), await page.locator('[data-role="run-problem"]').first().textContent({ timeout: 100 }).catch(() => '') ?? '').toBe(0);
    let report = await paneReport();
    expect(report.warnings[0]).toBe(`Joined on dates: the prices dated by 'Date A' and 'Date B' share ${shared} dates, ${report.data.first.date} to ${report.data.last.date}; GateGasoil lost ${a.length - shared} of its rows, DockDiesel lost ${b.length - shared} of its rows. Every test uses the shared dates only.`);
    expect(await page.locator('.warnings', { hasText: 'Joined on dates' }).count()).toBe(1);
    // The order step: DF-GLS beside ADF and KPSS, then chosen to decide.
    await page.locator('[data-series="GateGasoil"] details > summary').click();
    expect(await page.locator('[data-series="GateGasoil"] table.tests th', { hasText: 'DF-GLS' }).count()).toBe(1);
    expect(await page.locator('[data-series="GateGasoil"] table.tests tr.note-row').first().textContent()).toMatch(/^Rejects below -\d\.\d+ at 5%/);
    // Ng-Perron's MZt beside DF-GLS, for comparison: the pane shows the report's number.
    const mzt = page.locator('[data-series="GateGasoil"] table.tests tr', { hasText: 'Ng-Perron MZt' });
    expect(await mzt.count()).toBe(1);
    expect(await mzt.locator('td').first().textContent()).toBe(showNumber(report.series.find((s) => s.name === 'GateGasoil')!.steps[0].ngPerron!.statistic));
    await page.locator('fluent-radio[value="dfgls"]').click();
    await page.waitForSelector('[data-role="progress"]', { state: 'detached', timeout: 60_000 });
    report = await paneReport();
    expect(report.settings.unitRootTest).toBe('dfgls');
    expect(report.series.every((s) => s.decidedBy === 'dfgls')).toBe(true);
    await page.locator('[data-series="GateGasoil"] details > summary').click();
    expect(await page.locator('[data-series="GateGasoil"] [data-role="decided-by"]').textContent()).toMatch(/^Decided on the levels by the test with more power/);
    await shot(page, 'sheet-08-two-calendars-dfgls');

    await page.locator('[data-step="write"]').click();
    await page.locator('fluent-radio[value="beside"]').click();
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="written"]', { timeout: 60_000 });
    const written = (await page.locator('[data-role="written"] li').first().textContent()) ?? '';
    const name = /named (\S+)\.$/.exec(written)?.[1] ?? '';
    expect(written).toMatch(/^Wrote \d+ cells to Two!/);
    const formulas = await page.evaluate(async (n) => {
      const wb = window.__mooringWorkbook!;
      const found = (await wb.findBlock(n))!;
      const out: string[] = [];
      for (let r = 1; r <= 60; r++) for (let c = 0; c < 26; c++) {
        const f = wb.cellAt(found.sheet, `${String.fromCharCode(65 + c)}${r}`).stored?.formula;
        if (f) out.push(f);
      }
      return out;
    }, name);
    // One join over both calendars, each from its date column to its prices (the pane makes the data a table before writing, as it offers).
    const joins = formulas.filter((f) => f.includes('MOOR.COMMONDATES'));
    expect(joins).toHaveLength(1);
    expect(joins[0]).toMatch(new RegExp(`^=MOOR\\.COMMONDATES\\((\\w+\\[\\[Date A\\]:\\[GateGasoil\\]\\]|Two!\\$A\\$2:\\$B\\$${height + 1}),(\\w+\\[\\[Date B\\]:\\[DockDiesel\\]\\]|Two!\\$C\\$2:\\$D\\$${height + 1})\\)$`));
    expect(formulas.find((f) => f.includes('MOOR.ORDER'))).toContain('"dfgls"');
    await expectBlockMatchesReport(shared, name);
    await page.locator('#sheet [data-sheet="Two"]').click();
    await shot(page, 'sheet-09-two-calendars-block');
  });

  it('made no request outside the page and broke no content security rule', () => {
    expect(session.foreignRequests).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
