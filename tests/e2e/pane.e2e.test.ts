import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openPreview, shot, type PreviewSession } from './browser';

// The whole walk in real headless Chromium against the built preview page: the pane over the
// in-memory workbook with the demo data, driven by clicks and keys; the workbook is read back
// through window.__mooringWorkbook. Each step leaves a screenshot in test-artifacts/e2e/.

let session: PreviewSession;
let page: Page;

// The preview page exposes its in-memory workbook and pane as window.__mooringWorkbook and
// window.__mooringPane (declared in taskpane/preview/preview.ts).

const title = () => page.locator('#step-title').textContent();
const state = () => page.evaluate(() => {
  const s = window.__mooringPane!.state();
  return { step: s.step, observations: s.report?.data.observations ?? null, lagRule: s.report?.settings.lagRule ?? null };
});
const idle = () => page.waitForSelector('[data-role="progress"]', { state: 'detached', timeout: 30_000 });

beforeAll(async () => {
  session = await openPreview();
  page = session.page;
  await page.waitForSelector('[data-role="found"]');
});

afterAll(async () => {
  await session?.close();
});

describe('the pane in a browser', () => {
  it('finds the demo table around the selection and shows the rows it would use', async () => {
    expect(await page.locator('[data-role="found"]').textContent()).toBe("Found the table 'QuennelPrices' on Prices, A1:G781.");
    expect(await page.locator('[data-role="rows-used"]').textContent()).toBe('780 of 780 rows used, row 2 (2022-01-03) to row 781 (2024-12-27).');
    expect(await title()).toBe('1. Choose prices');
    // Later steps wait for a diagnosis.
    expect(await page.locator('[data-step="tied"]').getAttribute('disabled')).not.toBeNull();
    await shot(page, '01-choose-prices');
  });

  it('reaches every control of the first step by Tab, ticks a series by Space and runs by Enter', async () => {
    await page.locator('#step-title').focus();
    const seen = new Set<string>();
    for (let i = 0; i < 40 && !seen.has('run'); i++) {
      await page.keyboard.press('Tab');
      const key = await page.evaluate(() => {
        const a = document.activeElement as HTMLElement | null;
        return a?.getAttribute('data-role') ?? a?.getAttribute('data-column') ?? a?.getAttribute('data-choice') ?? a?.closest('[data-choice]')?.getAttribute('data-choice') ?? a?.tagName ?? '';
      });
      seen.add(key);
    }
    for (const k of ['detect', 'GateGasoil', 'HeavyFuel', 'log', 'gaps', 'from', 'to', 'alpha', 'run']) expect(seen).toContain(k);

    await page.locator('[data-column="HeavyFuel"]').focus();
    await page.keyboard.press('Space');
    await expect.poll(() => page.locator('[data-column="HeavyFuel"]').evaluate((e) => (e as unknown as { checked: boolean }).checked)).toBe(true);
    await page.locator('[data-column="HeavyFuel"]').focus();
    await page.keyboard.press('Space');
    await expect.poll(() => page.locator('[data-column="HeavyFuel"]').evaluate((e) => (e as unknown as { checked: boolean }).checked)).toBe(false);

    await page.locator('[data-role="run"]').focus();
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-series="DockDiesel"]', { timeout: 30_000 });
    expect(await title()).toBe('2. How each series moves');
    expect(await page.locator('[data-series="GateGasoil"] .verdict-mark').textContent()).toBe('Wanders');
    expect(await page.locator('[data-chart="series"] canvas').count()).toBe(1);
    expect(await page.locator('.cautions').textContent()).toContain('not advice to trade');
    await shot(page, '02-how-each-series-moves');
  });

  it('moves between steps by keys, and a changed choice runs the diagnosis again', async () => {
    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('3. Tied together?');
    expect(await page.locator('.verdict-mark').first().textContent()).toBe('Tied');
    await shot(page, '03-tied-together');
    // The choices of how the tests run are folded under their summary line.
    await page.locator('[data-role="tied-choices"] > summary').click();
    await page.locator('fluent-radio[value="bic"]').click();
    await idle();
    expect((await state()).lagRule).toBe('bic');
    expect(await page.locator('fluent-radio-group[data-choice="lagRule"]').getAttribute('value')).toBe('bic');

    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('4. The relation and its pull');
    expect(await page.locator('[data-role="pull"]').textContent()).toMatch(/^The spread closes half its gap in about \d+ days/);
    expect(await page.locator('[data-chart="spread"] canvas').count()).toBe(1);
    expect(await page.locator('[data-chart="rolling-z"] canvas').count()).toBe(1);
    expect(await page.locator('[data-chart="spread"] .u-legend').textContent()).toContain('+2 sd');
    await shot(page, '04-relation-and-pull');

    // The step strip: Right moves focus along it, Enter opens the step.
    await page.locator('[data-step="relation"]').focus();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('Enter');
    expect(await title()).toBe('5. Who moves first');
    expect(await page.locator('.verdict-mark').first().textContent()).toBe('GateGasoil moves first');
    await shot(page, '05-who-moves-first');
  });

  it('asks before replacing filled cells, then writes the block with its formulas and formats', async () => {
    await page.evaluate(() => window.__mooringWorkbook!.setValues('Prices', 'J3', [['keep me']]));
    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('6. Put it in the sheet');
    await page.locator('fluent-radio[value="cell"]').click();
    await page.locator('fluent-text-input[data-role="cell"] input').fill('J2');
    await page.keyboard.press('Tab');
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="confirm"]');
    expect(await page.locator('[data-role="confirm"] .question').textContent()).toBe('Writing here would replace 1 filled cell on Prices. Replace it?');
    expect(await page.locator('[data-role="confirm"] li').allTextContents()).toEqual(["J3 holds 'keep me'"]);
    expect(await page.evaluate(() => window.__mooringWorkbook!.shownValue('Prices', 'J3'))).toBe('keep me');
    await shot(page, '06-confirm-replace');

    await page.locator('[data-role="confirm-yes"]').click();
    await page.waitForSelector('[data-role="written"]');
    const lines = await page.locator('[data-role="written"] li').allTextContents();
    expect(lines[0]).toMatch(/^Wrote \d+ cells to Prices!J2:[A-Z]+\d+ \(\d+ rows by \d+ columns\), named Mooring_GateGasoil_DockDiesel\.$/);
    const block = await page.evaluate(() => {
      const wb = window.__mooringWorkbook!;
      const cells: { address: string; formula: string | undefined; format: { bold?: boolean; numberFormat?: string } | undefined; shown: unknown }[] = [];
      for (let r = 2; r <= 60; r++) for (const c of ['J', 'K', 'L', 'M']) {
        const at = wb.cellAt('Prices', `${c}${r}`);
        cells.push({ address: `${c}${r}`, formula: at.stored?.formula, format: at.stored?.format, shown: at.shown });
      }
      return { title: wb.shownValue('Prices', 'J2'), cells, charts: wb.charts.map((c) => c.name) };
    });
    expect(block.title).toBe('GateGasoil and DockDiesel: 780 rows, 2022-01-03 to 2024-12-27');
    expect(block.cells.find((c) => c.address === 'J2')?.format).toMatchObject({ bold: true });
    const formulas = block.cells.filter((c) => typeof c.formula === 'string');
    expect(formulas.length).toBeGreaterThan(5);
    expect(formulas.every((c) => c.formula!.startsWith('='))).toBe(true);
    expect(formulas.some((c) => c.formula!.includes('QuennelPrices'))).toBe(true);
    expect(block.cells.some((c) => typeof c.format?.numberFormat === 'string')).toBe(true);
    expect(block.charts).toEqual(['Mooring_GateGasoil_DockDiesel']);
    await shot(page, '07-written');
  });

  it('refreshes itself and the block when rows are pasted below the table', async () => {
    await page.evaluate(() => {
      const wb = window.__mooringWorkbook!;
      const rows: (string | number)[][] = [];
      const last = [1.4, 2.2, 500, 600, 40, 6];
      for (let i = 0; i < 12; i++) {
        const day = new Date(Date.UTC(2024, 11, 30 + i + 2 * Math.floor(i / 5)));
        rows.push([day.toISOString().slice(0, 10), ...last.map((v, j) => Number((v * (1 + 0.002 * Math.sin(i + j))).toFixed(4)))]);
      }
      wb.appendRows('QuennelPrices', rows);
    });
    await page.waitForSelector('[data-role="notice"]', { timeout: 30_000 });
    expect(await page.locator('[data-role="notice"]').textContent()).toBe('12 new rows since the last run: results updated. The block in the sheet was refreshed too.');
    expect((await state()).observations).toBe(792);
    expect(await page.evaluate(() => window.__mooringWorkbook!.shownValue('Prices', 'J2'))).toMatch(/^GateGasoil and DockDiesel: 792 rows, 2022-01-03 to /);
    await shot(page, '08-refreshed');
  });

  it('shows headers as text, runs a long job off the pane thread and cancels it', async () => {
    await page.evaluate(() => {
      const wb = window.__mooringWorkbook!;
      void wb.addSheet('Long');
      const names = ['<b>Bold</b>', ...Array.from({ length: 11 }, (_, j) => `S${j + 2}`)];
      const grid: (string | number)[][] = [names];
      const level = names.map(() => 100);
      let seed = 12345;
      const next = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) - 0.5;
      for (let i = 0; i < 3000; i++) grid.push(level.map((v, j) => (level[j] = v + next())));
      wb.setValues('Long', 'A1', grid);
      wb.select('Long', 'B2');
    });
    await page.locator('[data-step="data"]').click();
    await page.locator('[data-role="detect"]').click();
    await page.waitForSelector('[data-role="found"]:has-text("Long")');
    const bold = page.locator('[data-column="<b>Bold</b>"]');
    expect(await bold.count()).toBe(1);
    expect(await page.locator('.step-body b').count()).toBe(0);
    expect(await page.locator('label', { hasText: '<b>Bold</b>' }).count()).toBe(1);
    for (let j = 3; j <= 12; j++) await page.locator(`[data-column="S${j}"]`).click();
    await page.locator('[data-role="run"]').click();
    await page.waitForSelector('[data-role="progress-text"]:has-text("66 pairs")');
    // The pane thread stays free while the worker computes: a 50 ms timer still fires within
    // two seconds (on the pane thread the 66 pairs would hold it for far longer), and the
    // page still answers a click (the Cancel button below).
    const lag = await page.evaluate(() => new Promise<number>((done) => {
      const t = performance.now();
      setTimeout(() => done(performance.now() - t - 50), 50);
    }));
    expect(lag).toBeLessThan(2000);
    await shot(page, '09-long-run');
    await page.locator('[data-role="cancel"]').click();
    await page.waitForSelector('[data-role="notice"]:has-text("cancelled")');
    expect(await page.locator('[data-role="notice"]').textContent()).toBe('The diagnosis was cancelled: nothing changed. Run it again when you are ready.');
    expect((await state()).observations).toBe(792);
    expect(await page.locator('[data-role="stale"]').textContent()).toBe('Steps 2 to 6 still show the last run (GateGasoil, DockDiesel on Prices!A1:G793, prepared as "log, skip gaps") until you run the diagnosis again.');
    // The pane works on after a cancel: the next step still opens on the last report.
    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('2. How each series moves');
    await shot(page, '10-cancelled');
  });

  it('fits the narrowest pane, 320 px, with no sideways scrolling', async () => {
    await page.setViewportSize({ width: 320, height: 900 });
    for (const step of ['tied', 'relation']) {
      await page.locator(`[data-step="${step}"]`).click();
      const wide = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(wide).toBeLessThanOrEqual(320);
    }
    await shot(page, '11-narrow-320');
  });

  it('made no request outside the page and broke no content security rule', () => {
    expect(session.foreignRequests).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});
