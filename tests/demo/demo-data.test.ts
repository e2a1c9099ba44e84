import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEMO_TRUTH, demoCsv, generateDemo } from '../../addin/demo/scenario';
import { phiFromHalfLife } from '../../addin/demo/truth';

// The committed demo file is demoCsv() written out. MOORING_WRITE_DEMO=1 rewrites it instead
// of comparing (see the top of addin/demo/scenario.ts).
const DEMO_FILE = resolve(dirname(fileURLToPath(import.meta.url)), '../../addin/demo/data/quennel-delta.csv');
const WRITE = process.env.MOORING_WRITE_DEMO === '1';

describe('the committed demo file', () => {
  it(WRITE ? 'is rewritten from the generator (MOORING_WRITE_DEMO=1)' : 'equals the generator output byte for byte', () => {
    const csv = demoCsv();
    if (WRITE) {
      mkdirSync(dirname(DEMO_FILE), { recursive: true });
      writeFileSync(DEMO_FILE, csv, 'utf8');
    }
    expect(existsSync(DEMO_FILE), `${DEMO_FILE} is missing: run MOORING_WRITE_DEMO=1 npx vitest run tests/demo`).toBe(true);
    const committed = readFileSync(DEMO_FILE, 'utf8');
    expect(committed === csv, 'demo file drifted from the generator: rerun with MOORING_WRITE_DEMO=1 and commit both').toBe(true);
  });

  it('is under 120 KB, has LF line endings and one header row plus one row per day', () => {
    const csv = demoCsv();
    expect(Buffer.byteLength(csv, 'utf8')).toBeLessThan(120 * 1024);
    expect(csv.includes('\r')).toBe(false);
    const lines = csv.trimEnd().split('\n');
    expect(lines.length).toBe(DEMO_TRUTH.rows + 1);
    expect(lines[0]).toBe(['Date', ...DEMO_TRUTH.series.map((s) => s.name)].join(','));
    for (const line of lines) expect(line.split(',').length).toBe(DEMO_TRUTH.series.length + 1);
  });
});

describe('the demo generator', () => {
  it('gives the same table for the same seed and a different one for another seed', () => {
    expect(generateDemo(DEMO_TRUTH.seed)).toEqual(generateDemo(DEMO_TRUTH.seed));
    expect(generateDemo(DEMO_TRUTH.seed + 1).columns.GateGasoil).not.toEqual(generateDemo(DEMO_TRUTH.seed).columns.GateGasoil);
  });

  it('dates are consecutive weekdays in ISO form from the fixed start date', () => {
    const { dates } = generateDemo();
    expect(dates[0]).toBe(DEMO_TRUTH.startDate);
    expect(dates.length).toBe(DEMO_TRUTH.rows);
    for (let t = 0; t < dates.length; t++) {
      expect(dates[t]).toMatch(/^\d{4}-\d{2}-\d{2}$/);
      const day = new Date(`${dates[t]}T00:00:00Z`);
      expect(day.toISOString().slice(0, 10)).toBe(dates[t]);
      expect([0, 6]).not.toContain(day.getUTCDay());
      if (t > 0) {
        // consecutive weekdays: one day apart, or three across a weekend
        const gapDays = (day.getTime() - new Date(`${dates[t - 1]}T00:00:00Z`).getTime()) / 86_400_000;
        expect(gapDays).toBe(day.getUTCDay() === 1 ? 3 : 1);
      }
    }
  });

  it('every price is positive, finite and keeps at least 4 significant digits after rounding', () => {
    const { columns } = generateDemo();
    for (const s of DEMO_TRUTH.series) {
      const values = columns[s.name];
      expect(values.length).toBe(DEMO_TRUTH.rows);
      // with d decimals, a value of at least 10^(3-d) has 4 or more significant digits
      const floor = 10 ** (3 - s.decimals);
      for (const v of values) {
        expect(Number.isFinite(v)).toBe(true);
        expect(v).toBeGreaterThanOrEqual(floor);
      }
    }
  });

  it('the rounding moves no log price by more than 0.0004', () => {
    const { columns } = generateDemo();
    for (const s of DEMO_TRUTH.series) {
      const halfStep = 0.5 * 10 ** -s.decimals;
      const worst = Math.max(...columns[s.name].map((v) => halfStep / v));
      expect(worst, s.name).toBeLessThan(0.0004);
    }
  });
});

describe('DEMO_TRUTH is internally consistent', () => {
  it('each spread phi is 0.5^(1/half-life)', () => {
    for (const pair of DEMO_TRUTH.cointegratedPairs) expect(pair.phi).toBeCloseTo(phiFromHalfLife(pair.halfLifeDays), 14);
  });

  it('the loadings close the spread at rate phi - 1: alpha(dependent) - beta * alpha(regressor) = phi - 1', () => {
    for (const pair of DEMO_TRUTH.cointegratedPairs) {
      const net = pair.adjustment[pair.dependent] - pair.beta * pair.adjustment[pair.regressor];
      expect(net).toBeCloseTo(pair.phi - 1, 14);
    }
  });

  it('every named series exists, and every series has one integration order', () => {
    const names = new Set(DEMO_TRUTH.series.map((s) => s.name));
    const named = [
      ...DEMO_TRUTH.cointegratedPairs.flatMap((p) => [p.dependent, p.regressor]),
      DEMO_TRUTH.leadLag.leader,
      DEMO_TRUTH.leadLag.follower,
      ...DEMO_TRUTH.unrelated,
      ...DEMO_TRUTH.stationary,
    ];
    for (const name of named) expect(names.has(name), name).toBe(true);
    for (const name of DEMO_TRUTH.stationary) expect(DEMO_TRUTH.series.find((s) => s.name === name)?.integrationOrder).toBe(0);
    for (const name of DEMO_TRUTH.unrelated) expect(DEMO_TRUTH.series.find((s) => s.name === name)?.integrationOrder).toBe(1);
  });
});
