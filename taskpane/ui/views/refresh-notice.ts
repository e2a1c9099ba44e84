/**
 * What the pane says when the watched table changed and the pane refreshed itself:
 * "12 new rows since the last run: results updated", and what happened to the sheet block.
 */

/** The notice after a refresh from `before` rows to `after` rows. */
export function refreshNotice(before: number, after: number, blockRefreshed: boolean | null): string {
  const added = after - before;
  const rows = added > 0
    ? `${added} new row${added === 1 ? '' : 's'} since the last run: results updated.`
    : added < 0
      ? `${-added} row${added === -1 ? '' : 's'} fewer than at the last run: results updated.`
      : 'The table changed since the last run: results updated.';
  if (blockRefreshed === null) return rows;
  return `${rows} ${blockRefreshed ? 'The block in the sheet was refreshed too.' : 'The block in the sheet could not be refreshed: write it again from the last step.'}`;
}
