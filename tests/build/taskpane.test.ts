import { describe, expect, it } from 'vitest';
import { describeHost } from '../../taskpane/status';

describe('task pane host banner', () => {
  it('is hidden inside Excel', () => {
    expect(describeHost(true, 'Excel')).toEqual({ kind: 'ready', message: '' });
  });

  it('says Office is absent when Office.js did not load', () => {
    const status = describeHost(false);
    expect(status.kind).toBe('no-office');
    expect(status.message).toMatch(/Office is not available/);
  });

  it('says so when Office.js loaded without a host, or in another application', () => {
    expect(describeHost(true, null)).toMatchObject({ kind: 'wrong-host', message: expect.stringMatching(/no Office application/) });
    expect(describeHost(true, 'Word')).toEqual({ kind: 'wrong-host', message: 'Mooring runs in Excel, not in Word.' });
  });
});
