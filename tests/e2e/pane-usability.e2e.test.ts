import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openPreview, SHOTS, type PreviewSession } from './browser';

// The pane as a person uses it, in headless Chromium against the built preview page, at the
// three widths a pane is used at (320, 400 and 800 px): the step strip's names in view, the
// cautions shown once and one click away, the overview of all pairs (sorted, a pair opened
// by a press), marks whose words agree with their sentences, years on long time axes, Esc
// cancelling a run, the check through time, and two blocks of one pair that keep their own
// names and are both refreshed. Screenshots of the pane alone go to test-artifacts/e2e/.

let session: PreviewSession;
let page: Page;

const title = () => page.locator('#step-title').textContent();
const idle = () => page.waitForSelector('[data-role="progress"]', { state: 'detached', timeout: 60_000 });

/** Makes the pane `width` px wide (the preview's sheet takes the rest of the window). */
async function widen(width: number): Promise<void> {
  await page.setViewportSize({ width: Math.max(width + 200, 900), height: 900 });
  // Through the style object (the page's content security policy refuses a style element).
  await page.evaluate((w) => {
    const frame = document.querySelector<HTMLElement>('.pane-frame')!;
    for (const [k, v] of [['width', `${w}px`], ['max-width', 'none'], ['min-width', '0'], ['flex', `0 0 ${w}px`]]) frame.style.setProperty(k, v, 'important');
  }, width);
  await page.waitForFunction((w) => Math.round(document.querySelector('.pane-frame')!.getBoundingClientRect().width) === w, width);
}

/** A screenshot of the pane alone, its full height. */
async function paneShot(name: string): Promise<void> {
  await page.locator('.pane-frame').screenshot({ path: `${SHOTS}usability-${name}.png` });
}

/** Whether the pane scrolls sideways. */
const sideways = () => page.evaluate(() => {
  const f = document.querySelector<HTMLElement>('.pane-frame')!;
  return f.scrollWidth > f.clientWidth + 1;
});

beforeAll(async () => {
  session = await openPreview();
  page = session.page;
  await page.waitForSelector('[data-role="found"]');
});

afterAll(async () => {
  await session?.close();
});

describe('the pane as a person uses it', () => {
  it('shows each step by number and name on the strip, at 320 px too', async () => {
    await widen(320);
    const strip = await page.locator('.step-strip fluent-button').evaluateAll((buttons) => buttons.map((b) => {
      const name = b.querySelector<HTMLElement>('.step-name')!;
      return { text: (b.textContent ?? '').replace(/\s+/g, ' ').trim(), shown: name.getBoundingClientRect().width > 0 && name.scrollWidth <= name.clientWidth };
    }));
    expect(strip.map((s) => s.text)).toEqual(['1Prices', '2Series', '3Tied?', '4Relation', '5Leader', '6To sheet']);
    expect(strip.every((s) => s.shown)).toBe(true);
    expect(await page.locator('[data-step="tied"]').getAttribute('aria-label')).toBe('Step 3 of 6: Tied together? (after the diagnosis has run)');
    await paneShot('320-01-strip');
  });

  it('cancels a running diagnosis with Esc', async () => {
    for (const name of ['HeavyFuel', 'BunkerBlend', 'BargeFreight', 'TankPremium']) await page.locator(`[data-column="${name}"]`).click();
    await page.locator('[data-role="run"]').click();
    await page.waitForSelector('[data-role="progress"]');
    await page.keyboard.press('Escape');
    await page.waitForSelector('[data-role="notice"]:has-text("cancelled")');
    expect(await page.evaluate(() => window.__mooringPane!.state().report)).toBeNull();
    expect(await title()).toBe('1. Choose prices');
  });

  it('says how many of six prices wander in agreeing words, and shows the cautions once, open the first time', async () => {
    await page.locator('[data-role="run"]').click();
    await page.waitForSelector('[data-series="TankPremium"]', { timeout: 60_000 });
    expect(await page.locator('.headline').textContent()).toBe('5 of 6 prices wander; pairs with the other are not read as long-run ties.');
    expect(await page.locator('.cautions').count()).toBe(1);
    expect(await page.locator('.cautions').getAttribute('open')).not.toBeNull();
    expect(await page.locator('.cautions').textContent()).toContain('not advice to trade');
    // The series chart spans three years: every tick names its year.
    const ticks = await page.locator('[data-chart="series"]').getAttribute('data-x-ticks');
    expect(ticks?.split(' | ').every((t) => /\b20\d\d\b/.test(t))).toBe(true);
    await paneShot('320-02-series');
    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('3. Tied together?');
    // Folded on the next step, one click from view, and still only once.
    expect(await page.locator('.cautions').count()).toBe(1);
    expect(await page.locator('.cautions').getAttribute('open')).toBeNull();
    expect(await page.locator('.cautions > summary').textContent()).toBe('Before you rely on this (4 points)');
  });

  it('gives all 15 pairs in one sortable table at 320 px, in a step far shorter than before', async () => {
    const rows = page.locator('[data-role="pair-overview"] tbody tr');
    expect(await rows.count()).toBe(15);
    expect(await sideways()).toBe(false);
    // The table itself fits: nothing of it hides behind a scroll of its own.
    expect(await page.locator('.overview-wrap').evaluate((w) => w.scrollWidth <= w.clientWidth + 1)).toBe(true);
    const height = await page.locator('.step-body').evaluate((e) => e.getBoundingClientRect().height);
    // The step was about 2,900 px tall at 320 px with six series; the overview and the folded parts keep it under 1,800.
    expect(height).toBeLessThan(1800);
    await paneShot('320-03-tied-overview');

    const worst = async () => (await page.locator('[data-role="pair-overview"] tbody td.num:nth-of-type(2)').allTextContents())
      .map((t) => Math.max(...t.split('/').map((p) => Number(p.replace(/[<>\s]/g, '')))));
    await page.locator('button[data-sort="p"]').click();
    expect(await page.locator('th:has(button[data-sort="p"])').getAttribute('aria-sort')).toBe('ascending');
    const up = await worst();
    expect(up).toEqual([...up].sort((a, b) => a - b));
    await page.locator('button[data-sort="p"]').click();
    expect(await page.locator('th:has(button[data-sort="p"])').getAttribute('aria-sort')).toBe('descending');
    expect(await worst()).toEqual([...up].reverse());
  });

  it('opens a pair from the table, and its mark agrees with the words under it', async () => {
    await page.locator('button.pair-open', { hasText: 'HeavyFuel and BunkerBlend' }).click();
    expect(await page.locator('.pair-title').textContent()).toBe('HeavyFuel and BunkerBlend');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('pair-detail');
    const mark = page.locator('.step-body > .verdict .verdict-mark');
    expect(await mark.textContent()).toBe('Mixed evidence');
    expect(await mark.getAttribute('data-tone')).toBe('unsure');
    expect(await page.locator('.step-body > .verdict .verdict-text').textContent()).toMatch(/Johansen's rank test, however, finds no relation/);
    await paneShot('320-04-mixed-evidence');

    await page.locator('button.pair-open', { hasText: 'GateGasoil and TankPremium' }).click();
    expect(await mark.textContent()).toBe('Not two wandering prices');
    expect(await page.locator('.step-body').textContent()).not.toContain('Tests do not apply');
    await page.locator('[data-role="johansen"] > summary').click();
    expect(await page.locator('[data-role="johansen-note"]').textContent()).toMatch(/not a tie between the two/);
    await paneShot('320-05-not-wandering');
  });

  it('checks a pair through time on demand, with charts and the one-break tests, at 400 px', async () => {
    await widen(400);
    await page.locator('button.pair-open', { hasText: 'GateGasoil and DockDiesel' }).click();
    expect(await mark()).toBe('Tied');
    await page.keyboard.press('Alt+ArrowRight');
    expect(await title()).toBe('4. The relation and its pull');
    await page.locator('[data-role="stability-run"]').click();
    await page.waitForSelector('[data-chart="rolling-p"] canvas', { timeout: 60_000 });
    for (const id of ['rolling-p', 'rolling-beta', 'rolling-half-life']) expect(await page.locator(`[data-chart="${id}"] canvas`).count()).toBe(1);
    expect(await page.locator('[data-role="rolling-summary"]').textContent()).toMatch(/rolling windows of 250 rows/);
    const breaks = await page.locator('.through-time table.tests tbody th').allTextContents();
    expect(breaks).toHaveLength(4);
    expect(breaks[0]).toMatch(/^A shift in the level of the relation \(found at 20\d\d-\d\d-\d\d\)$/);
    expect(await sideways()).toBe(false);
    await paneShot('400-06-through-time');
  });

  it('labels the months of a wide chart with their years, at 800 px', async () => {
    await widen(800);
    await page.locator('[data-step="series"]').click();
    await page.waitForSelector('[data-chart="series"][data-x-ticks]');
    const ticks = (await page.locator('[data-chart="series"]').getAttribute('data-x-ticks'))!.split(' | ');
    expect(ticks.length).toBeGreaterThan(3);
    expect(ticks.every((t) => /\b20\d\d$/.test(t))).toBe(true);
    await paneShot('800-07-series');
    await page.locator('[data-step="relation"]').click();
    const spreadTicks = (await page.locator('[data-chart="spread"]').getAttribute('data-x-ticks'))!.split(' | ');
    expect(spreadTicks.every((t) => /\b20\d\d$/.test(t))).toBe(true);
    await paneShot('800-08-relation');
    await page.locator('[data-step="tied"]').click();
    await paneShot('800-09-tied');
  });

  it('writes a second block of the pair elsewhere under its own name, and a refresh rewrites both', async () => {
    await widen(400);
    await page.locator('[data-step="write"]').click();
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="written"]');
    expect(await page.locator('[data-role="written"] li').first().textContent()).toMatch(/named Mooring_GateGasoil_DockDiesel\.$/);
    await page.locator('fluent-radio[value="new-sheet"]').click();
    await page.locator('[data-role="write"]').click();
    await page.waitForSelector('[data-role="written"]:has-text("_2")');
    expect(await page.locator('[data-role="written"] li').first().textContent()).toMatch(/named Mooring_GateGasoil_DockDiesel_2\.$/);
    await paneShot('400-10-second-block');
    const blocks = await page.evaluate(async () => {
      const wb = window.__mooringWorkbook!;
      return {
        first: (await wb.findBlock('Mooring_GateGasoil_DockDiesel'))?.sheet,
        second: (await wb.findBlock('Mooring_GateGasoil_DockDiesel_2'))?.sheet,
        charts: wb.charts.map((c) => `${c.name}@${c.sheet}`),
      };
    });
    expect(blocks.first).toBe('Prices');
    expect(blocks.second).not.toBe('Prices');
    expect(blocks.charts).toEqual([`Mooring_GateGasoil_DockDiesel@Prices`, `Mooring_GateGasoil_DockDiesel_2@${blocks.second}`]);

    await page.evaluate(() => {
      const rows: (string | number)[][] = [];
      const last = [1.4, 2.2, 500, 600, 40, 6];
      for (let i = 0; i < 5; i++) rows.push([new Date(Date.UTC(2024, 11, 30 + i)).toISOString().slice(0, 10), ...last.map((v, j) => Number((v * (1 + 0.002 * Math.sin(i + j))).toFixed(4)))]);
      window.__mooringWorkbook!.appendRows('QuennelPrices', rows);
    });
    await page.waitForSelector('[data-role="notice"]', { timeout: 60_000 });
    await idle();
    expect(await page.locator('[data-role="notice"]').textContent()).toBe('5 new rows since the last run: results updated. Both blocks in the sheet were refreshed too.');
    const titles = await page.evaluate(async () => {
      const wb = window.__mooringWorkbook!;
      const second = (await wb.findBlock('Mooring_GateGasoil_DockDiesel_2'))!;
      return [wb.shownValue('Prices', 'I1'), wb.shownValue(second.sheet, second.address.split(':')[0])];
    });
    for (const t of titles) expect(t).toMatch(/^GateGasoil and DockDiesel: 785 rows/);
  });

  it('made no request outside the page and broke no content security rule', () => {
    expect(session.foreignRequests).toEqual([]);
    expect(session.errors).toEqual([]);
  });
});

const mark = () => page.locator('.step-body > .verdict .verdict-mark').textContent();
