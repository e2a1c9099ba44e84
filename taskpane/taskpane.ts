// Task pane entry. A placeholder until the pane's features arrive: it shows the
// product name and, when the page is not running inside Excel, a banner saying so.
// Every Office call is guarded, and text goes in through textContent only.

import { describeHost, type HostStatus } from './status';

function showStatus(status: HostStatus): void {
  const banner = document.getElementById('host-status');
  if (!banner) return;
  banner.textContent = status.message;
  banner.dataset.kind = status.kind;
  banner.hidden = status.kind === 'ready';
}

function start(): void {
  if (typeof Office === 'undefined') {
    showStatus(describeHost(false));
    return;
  }
  void Office.onReady((info) => {
    // The typings declare HostType as a numeric enum; at run time its values are names.
    const host = info.host == null ? null : info.host === Office.HostType.Excel ? 'Excel' : String(info.host);
    showStatus(describeHost(true, host));
  });
}

if (typeof document !== 'undefined') {
  if (document.readyState === 'loading') {
    document.addEventListener('DOMContentLoaded', start);
  } else {
    start();
  }
}
