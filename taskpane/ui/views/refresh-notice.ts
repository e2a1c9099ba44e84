/**
 * What the pane says when the watched table changed and the pane refreshed itself:
 * "12 new rows since the last run: results updated", and what happened to the blocks in the sheet.
 */

/** The notice after a refresh from `before` rows to `after` rows; `blocks` counts the blocks in the sheet refreshed of those written (null: none written). */
export function refreshNotice(before: number, after: number, blocks: { refreshed: number; total: number } | null): string {
  const added = after - before;
  const rows = added > 0
    ? `${added} new row${added === 1 ? '' : 's'} since the last run: results updated.`
    : added < 0
      ? `${-added} row${added === -1 ? '' : 's'} fewer than at the last run: results updated.`
      : 'The table changed since the last run: results updated.';
  if (blocks === null || blocks.total === 0) return rows;
  const { refreshed, total } = blocks;
  if (total === 1) return `${rows} ${refreshed === 1 ? 'The block in the sheet was refreshed too.' : 'The block in the sheet could not be refreshed: write it again from the last step.'}`;
  if (refreshed === total) return `${rows} ${total === 2 ? 'Both blocks' : `All ${total} blocks`} in the sheet were refreshed too.`;
  const missed = total - refreshed;
  return `${rows} ${refreshed} of ${total} blocks in the sheet were refreshed; ${missed === 1 ? 'the other one' : `the other ${missed}`} could not be: write ${missed === 1 ? 'it' : 'them'} again from the last step.`;
}
