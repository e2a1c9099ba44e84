/**
 * The results block of the demo pair written to the in-memory workbook: its layout, its
 * formulas (structured references to QuennelPrices), formats, readings, chart and name, and
 * its numbers as the workbook calculates them, which must equal the diagnostic report's
 * numbers for the same data (the report is the reference: both run the same engine).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { writePlannedBlock, planBlockWrite } from '../../taskpane/block/plan-block-write';
import { FILL } from '../../taskpane/block/block-style';
import { demoBlock, rowOf } from './demo-block';

type Demo = Awaited<ReturnType<typeof demoBlock>>;
let demo: Demo;
const shown = (a: string) => demo.wb.shownValue('Prices', a);
const formula = (a: string) => demo.wb.cellAt('Prices', a).stored?.formula;

beforeAll(async () => {
  demo = await demoBlock();
  const plan = await planBlockWrite(demo.wb, demo.built.block, demo.built.chart);
  expect(plan.safe).toBe(true);
  const out = await writePlannedBlock(demo.wb, plan);
  expect(out.ok).toBe(true);
  expect(out.chart.added).toBe(true);
});

describe('the demo block', () => {
  it('sits two columns right of the table, titled with both series and the sample', () => {
    expect(demo.built.block.anchor).toBe('I1');
    expect(shown('I1')).toBe('GateGasoil and DockDiesel: 780 rows, 2022-01-03 to 2024-12-27');
    expect(shown('I2')).toContain('table QuennelPrices');
    expect(formula('J3')).toBe('=ROWS(QuennelPrices[DockDiesel])');
    expect(shown('J3')).toBe(780);
  });

  it('runs its sections in the order the evidence builds and ends with the four cautions', () => {
    const labels = demo.built.block.cells.map((r) => r[0]?.value).filter((v): v is string => typeof v === 'string');
    const order = ['Each series on its own', 'Are they tied together in the long run?', 'The long-run line of DockDiesel on GateGasoil', 'Which one moves first?', 'Before you rely on any of this'];
    const at = order.map((h) => labels.findIndex((l) => l.startsWith(h)));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect([...at].sort((p, q) => p - q)).toEqual(at);
    const last4 = labels.slice(-4);
    expect(last4).toEqual(demo.report.cautions);
    expect(last4.join(' ')).toMatch(/not advice/);
    expect(last4.join(' ')).toMatch(/break/);
    expect(last4.join(' ')).toMatch(/false discoveries/);
    expect(last4.join(' ')).toMatch(/risk policy and licensed financial advice/);
  });

  it('points every number at the table by structured reference, with the report\'s settings', () => {
    const r = (label: string) => formula(`J${rowOf(demo.built, label)}`);
    expect(r('Does GateGasoil wander?')).toBe('=INDEX(MOOR.ORDER(HSTACK(QuennelPrices[GateGasoil],QuennelPrices[DockDiesel]),0.05,"const","adf",$J$5),1,1)');
    expect(r('Tied? Engle-Granger, GateGasoil on DockDiesel')).toBe('=MOOR.ENGLEGRANGER(QuennelPrices[GateGasoil],QuennelPrices[DockDiesel],"const","aic","headline",$J$5)');
    expect(r('Tied? Engle-Granger, DockDiesel on GateGasoil')).toBe('=MOOR.ENGLEGRANGER(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"const","aic","headline",$J$5)');
    expect(r('Tied? Phillips-Ouliaris')).toBe('=MOOR.PHILLIPSOULIARIS(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"const","auto","headline",$J$5)');
    expect(r('Tied? Johansen')).toBe('=MOOR.JOHANSEN(QuennelPrices[[GateGasoil]:[DockDiesel]],1,"restricted-constant","headline",$J$5)');
    expect(r('Long-run relations found')).toBe('=MOOR.RANK(QuennelPrices[[GateGasoil]:[DockDiesel]],1,"restricted-constant",0.05,$J$5)');
    expect(r('Hedge ratio: units')).toBe('=MOOR.HEDGE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"ols","slope",$J$5)');
    expect(r('Hedge ratio (dynamic OLS)')).toBe('=MOOR.HEDGE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"dols","slope",$J$5)');
    expect(r('Hedge ratio now, allowed to move')).toBe('=MOOR.MOVINGHEDGE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"latest",,,$J$5)');
    expect(r('Does DockDiesel move back?')).toBe('=MOOR.ECM(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"aic","headline",$J$5)');
    expect(r('Does the spread revert?')).toBe('=MOOR.HALFLIFE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"value",$J$5)');
    expect(r('Half-life, low end')).toBe('=MOOR.HALFLIFE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"low",$J$5)');
    expect(r('Half-life, high end')).toBe('=MOOR.HALFLIFE(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],"high",$J$5)');
    expect(r('Where the spread is heading')).toBe('=INDEX(MOOR.AHEAD(HSTACK(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil]),20,1,1,"restricted-constant","spread",$J$5),20,1)');
    expect(r('Is the spread stretched now?')).toBe('=INDEX(R3#,ROWS(R3#))');
  });

  it('shows the report\'s numbers for the same data', () => {
    const p = demo.report.pairs[0];
    const v = (label: string) => shown(`J${rowOf(demo.built, label)}`) as number;
    expect(v('Does GateGasoil wander?')).toBe(demo.report.series[0].order);
    expect(v('Tied? Engle-Granger, GateGasoil on DockDiesel')).toBeCloseTo(p.cointegration.engleGranger.aOnB.pValue!, 12);
    expect(v('Tied? Engle-Granger, DockDiesel on GateGasoil')).toBeCloseTo(p.cointegration.engleGranger.bOnA.pValue!, 12);
    expect(v('Tied? Phillips-Ouliaris')).toBeCloseTo(p.cointegration.phillipsOuliaris!.pValue!, 12);
    expect(v('Tied? Johansen')).toBeCloseTo(p.cointegration.johansen!.trace[0].pValue!, 12);
    expect(v('Long-run relations found')).toBe(p.cointegration.johansen!.rank.trace);
    expect(v('Hedge ratio: units')).toBeCloseTo(p.relation!.ols.beta, 12);
    expect(v('Hedge ratio (dynamic OLS)')).toBeCloseTo(p.relation!.dynamicOls.beta, 12);
    expect(v('Does DockDiesel move back?')).toBeCloseTo(p.adjustment!.ecm.dependent.speed, 12);
    expect(v('Hedge ratio now, allowed to move')).toBeCloseTo(p.movingHedge!.latest.beta, 12);
    expect(v('Where the spread is heading')).toBeCloseTo(p.forecast!.spread.path[p.forecast!.horizon - 1], 10);
    expect(v('Does the spread revert?')).toBeCloseTo(p.adjustment!.spreadAr1.halfLife!, 10);
    expect(v('Half-life, low end of its 95% interval')).toBeCloseTo(p.adjustment!.spreadAr1.halfLifeInterval.low!, 10);
    expect(v('Half-life, high end of its 95% interval')).toBeCloseTo(p.adjustment!.spreadAr1.halfLifeInterval.high!, 10);
    expect(v('Is the spread stretched now?')).toBeCloseTo(p.spread!.latestZ, 10);
    expect(shown('P3')).toBeCloseTo(p.spread!.bandUpper, 10);
    expect(shown('Q3')).toBeCloseTo(p.spread!.bandLower, 10);
  });

  it('writes the lead-lag p-values of Toda-Yamamoto as fixed numbers, marked so', () => {
    const p = demo.report.pairs[0];
    expect(p.leadLag!.method).toBe('toda-yamamoto');
    const row = rowOf(demo.built, 'Does GateGasoil lead DockDiesel?');
    expect(formula(`J${row}`)).toBeUndefined();
    expect(shown(`J${row}`)).toBe(p.leadLag!.aLeadsB.test.pValue);
    expect(demo.wb.cellAt('Prices', `J${row}`).stored?.format?.fill).toBe(FILL.fixed);
    expect(shown(`L${row}`)).toMatch(/fixed as written/);
  });

  it('turns each p-value into words by formula, and the fill follows the words', () => {
    const row = rowOf(demo.built, 'Tied? Engle-Granger, GateGasoil on DockDiesel');
    expect(formula(`K${row}`)).toBe(`=IF(ISNUMBER(J${row}),IF(J${row}<0.05,"yes: tied (evidence at 5%)","no: no evidence of a tie at 5%"),"n/a: no p-value (see the message on the number)")`);
    expect(shown(`K${row}`)).toBe('yes: tied (evidence at 5%)');
    expect(demo.wb.fillAt('Prices', `K${row}`)).toBe(FILL.supported);
    const lead = rowOf(demo.built, 'Does DockDiesel lead GateGasoil?');
    expect(shown(`K${lead}`)).toBe('no: no evidence of a lead at 5%');
    expect(demo.wb.fillAt('Prices', `K${lead}`)).toBe(FILL.notSupported);
  });

  it('formats p-values, ratios and the half-life as the block promises', () => {
    const nf = (label: string) => demo.wb.cellAt('Prices', `J${rowOf(demo.built, label)}`).stored?.format?.numberFormat;
    expect(nf('Tied? Engle-Granger, GateGasoil')).toBe('0.0000');
    expect(nf('Hedge ratio: units')).toBe('0.000');
    expect(nf('Does the spread revert?')).toBe('0.0 "days"');
    expect(demo.wb.cellAt('Prices', 'I1').stored?.format?.heading).toBe(1);
    expect(demo.wb.cellAt('Prices', `I${rowOf(demo.built, 'Which one moves first?')}`).stored?.format?.heading).toBe(2);
  });

  it('spills the spread, its bands and z-scores down one row per data row, and charts them', () => {
    expect(formula('O3')).toBe('=MOOR.SPREAD(QuennelPrices[DockDiesel],QuennelPrices[GateGasoil],,$J$5)');
    expect(formula('P3')).toBe('=IF(ISNUMBER(O3#),AVERAGE(O3#)+2*STDEV.S(O3#),NA())');
    const p = demo.report.pairs[0];
    expect(shown('O782')).toBeCloseTo(p.spread!.latest, 12);
    expect(shown('N782')).toBe('2024-12-27');
    expect(shown('O783')).toBeNull();
    expect(demo.built.block.reserved).toEqual(['N46:R782']);
    expect(demo.wb.charts).toHaveLength(1);
    const chart = demo.wb.charts[0];
    expect(chart.name).toBe('Mooring_GateGasoil_DockDiesel');
    expect(chart.categories).toBe('N3:N782');
    expect(chart.series.map((s) => s.values)).toEqual(['O3:O782', 'P3:P782', 'Q3:Q782']);
    const values = demo.wb.shownValues('Prices', 'O3:O782').map((r) => r[0]);
    expect(values.every((v) => typeof v === 'number')).toBe(true);
  });

  it('is found again by its workbook-level name, with a note saying where its data came from', async () => {
    const found = await demo.wb.findBlock('Mooring_GateGasoil_DockDiesel');
    expect(found?.sheet).toBe('Prices');
    expect(found?.address).toBe(`I1:R${demo.built.block.cells.length}`);
    expect(JSON.parse(found!.note!)).toMatchObject({ t: 'QuennelPrices', a: 'GateGasoil', b: 'DockDiesel' });
  });
});
