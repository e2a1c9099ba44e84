/**
 * Starts the pane on a page: registers the Fluent components, applies the theme, and
 * mounts the walk into the page's main element with a port and the runner.
 */
import type { WorkbookPort } from '../workbook/port';
import { chooseRunner } from '../worker/choose-runner';
import { useFluentTheme } from './fluent';
import { mountPane, type PaneHandle } from './pane';

/** Mounts the pane into the element with id "pane" (or the body) over `port`. */
export function bootPane(port: WorkbookPort): PaneHandle {
  useFluentTheme();
  const root = document.getElementById('pane') ?? document.body;
  root.classList.add('pane');
  return mountPane(root, { port, runner: chooseRunner() });
}
