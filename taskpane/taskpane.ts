// Task pane entry. Inside Excel the guided pane starts over the Office adapter of the
// workbook port; elsewhere the page says that it needs Excel (the preview page,
// preview/preview.html, runs the same pane over the in-memory workbook instead).
// Every Office call is guarded, and text goes in through textContent only.

import { describeHost, type HostStatus } from './status';
import { bootPane } from './ui/boot';
import { OfficeWorkbook } from './workbook/office-adapter';

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
    const status = describeHost(true, host);
    showStatus(status);
    if (status.kind === 'ready') bootPane(new OfficeWorkbook());
  });
}

if (typeof document !== 'undefined') {
  if (document.readyState === 'loading') {
    document.addEventListener('DOMContentLoaded', start);
  } else {
    start();
  }
}
