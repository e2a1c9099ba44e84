// What the pane says about its host. Kept free of Office and DOM calls so it can be tested.

export type HostStatusKind = 'ready' | 'no-office' | 'wrong-host';

export interface HostStatus {
  readonly kind: HostStatusKind;
  /** Shown as a banner when not ready. */
  readonly message: string;
}

/**
 * @param officeLoaded whether Office.js defined the global `Office`
 * @param host the host Office.onReady reported (`Office.HostType`), or null outside Office
 */
export function describeHost(officeLoaded: boolean, host?: string | null): HostStatus {
  if (!officeLoaded) {
    return {
      kind: 'no-office',
      message:
        'Office is not available: this page was opened outside Excel, or Office.js could not be loaded. ' +
        'Mooring works inside Excel; open it from the Mooring button on the Home tab.',
    };
  }
  if (host !== 'Excel') {
    return {
      kind: 'wrong-host',
      message: host
        ? `Mooring runs in Excel, not in ${host}.`
        : 'Office.js loaded, but no Office application is hosting this page. Open Mooring from Excel.',
    };
  }
  return { kind: 'ready', message: '' };
}
