import { describe, expect, it } from 'vitest';
import { renderCautions } from '../../addin/cli/render/cautions';
import { formatPValue, formatStatistic, labelled, REPORT_WIDTH } from '../../addin/cli/render/format';
import { testResultJson } from '../../addin/cli/render/test-json';
import { readingAt5, renderTestTerminal } from '../../addin/cli/render/test-terminal';
import type { TestResult } from '../../addin/result';

/** A hand-made result, so the renderers are tested apart from any test's arithmetic. */
function result(overrides: Partial<TestResult> = {}): TestResult {
  return {
    test: 'ADF',
    title: 'Unit-root test (ADF) on Crude',
    statisticName: 'tau',
    statistic: -3.5,
    pValue: 0.0123,
    critical: { '1%': -3.46, '5%': -2.87, '10%': -2.57 },
    rejectTail: 'lower',
    lags: 3,
    lagRule: 'aic',
    nobs: 246,
    deterministic: 'const',
    nullHypothesis: 'Crude has a unit root',
    alternative: 'Crude is stationary around a constant level',
    warnings: [],
    details: [{ key: 'gamma', label: 'Coefficient on the lagged level', value: -0.05 }],
    ...overrides,
  };
}

describe('renderTestTerminal', () => {
  it('shows the title, statistic, p-value, reading, critical values, lags, observations, terms and hypotheses', () => {
    const text = renderTestTerminal(result());
    expect(text.split('\n')[0]).toBe('Unit-root test (ADF) on Crude');
    expect(text).toContain('Statistic (tau)       -3.5000');
    expect(text).toContain('p-value               0.0123');
    expect(text).toContain('rejected at 5%');
    expect(text).toContain('1%: -3.4600   5%: -2.8700   10%: -2.5700');
    expect(text).toContain('Lagged differences    3, chosen by AIC');
    expect(text).toContain('Observations          246');
    expect(text).toContain('Deterministic terms   constant');
    expect(text).toContain('Null hypothesis       Crude has a unit root');
    expect(text).toContain('Coefficient on the lagged level');
    expect(text).not.toContain('Warnings');
  });

  it('a null p-value reads "not available" with its note, and the reading falls back on the critical value', () => {
    const text = renderTestTerminal(result({ pValue: null, pValueNote: 'no table covers this case', statistic: -2.0 }));
    expect(text).toContain('p-value               not available (no table covers this case)');
    expect(text).toContain('not rejected at 5% (by the 5% critical value)');
  });

  it('no p-value and no 5% critical value gives no reading rather than a guess', () => {
    expect(readingAt5(result({ pValue: null, critical: { '1%': -3.4 } }))).toMatch(/^no reading at 5%/);
  });

  it('upper-tail tests read the right way round', () => {
    const kpss = result({ rejectTail: 'upper', statistic: 0.2, pValue: 0.1, critical: { '10%': 0.347, '5%': 0.463 }, lags: null, bandwidth: 9 });
    const text = renderTestTerminal(kpss);
    expect(text).toContain('not rejected at 5%');
    expect(text).toContain('the statistic is above the critical value');
    expect(text).toContain('Bandwidth             9 lags in the Bartlett kernel');
    expect(text).not.toContain('Lagged differences');
  });

  it('lists warnings, and leaves out details that are not available', () => {
    const text = renderTestTerminal(result({ warnings: ['Only 30 observations.'], details: [{ key: 'maxLags', label: 'Largest lag searched', value: null }] }));
    expect(text).toContain('Warnings\n  ! Only 30 observations.');
    expect(text).not.toContain('Largest lag searched');
  });

  it('keeps every line within the report width', () => {
    const long = 'word '.repeat(60).trim();
    const text = renderTestTerminal(result({ nullHypothesis: long, warnings: [long] }));
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(REPORT_WIDTH);
  });
});

describe('testResultJson', () => {
  it('carries the contract fields, details as an object, and nulls for missing numbers', () => {
    const json = testResultJson(result({ details: [{ key: 'zAlpha', label: 'Z-alpha', value: -20.5 }, { key: 'odd', label: 'x', value: NaN }] }));
    expect(json).toMatchObject({
      test: 'ADF', statistic: -3.5, pValue: 0.0123, lags: 3, nobs: 246, deterministic: 'const',
      critical: { '1%': -3.46, '5%': -2.87, '10%': -2.57 }, nullHypothesis: 'Crude has a unit root',
      warnings: [], details: { zAlpha: -20.5, odd: null }, bandwidth: null, rejectsAt5: true,
    });
    expect(JSON.parse(JSON.stringify(json))).toEqual(json);
  });

  it('a non-finite statistic becomes null, never NaN', () => {
    expect(testResultJson(result({ statistic: NaN, pValue: null })).statistic).toBeNull();
  });
});

describe('formatting', () => {
  it('statistics and p-values', () => {
    expect(formatStatistic(-2.87)).toBe('-2.8700');
    expect(formatStatistic(1.5e-5)).toBe('1.500e-5');
    expect(formatStatistic(NaN)).toBe('not available');
    expect(formatPValue(0.00001)).toBe('< 0.0001');
    expect(formatPValue(null)).toBe('not available');
  });

  it('a long label stands on its own line', () => {
    expect(labelled('A label far longer than the label column', '1')).toBe(`  A label far longer than the label column\n${' '.repeat(24)}1`);
  });

  it('the cautions cover evidence, breaks, false discoveries and the user\'s own policy', () => {
    const text = renderCautions();
    expect(text).toMatch(/evidence, not advice/);
    expect(text).toMatch(/break/);
    expect(text).toMatch(/false discoveries/);
    expect(text).toMatch(/risk policy and licensed financial advice come first/);
  });
});
