/**
 * Text for the HTML report: every string that comes from data (series names from a CSV
 * header, dates, the engine's sentences that quote them) passes through escapeHtml before
 * it reaches the page, in element content and in attribute values alike.
 */

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** The text with &, <, >, " and ' replaced by entities: safe in content and in quoted attributes. */
export function escapeHtml(text: string): string {
  return String(text).replace(/[&<>"']/g, (c) => ENTITIES[c]);
}

/** An element with escaped text content: el('td', 'A & B', 'num') -> <td class="num">A &amp; B</td>. */
export function el(tag: string, text: string, className?: string): string {
  return `<${tag}${className ? ` class="${escapeHtml(className)}"` : ''}>${escapeHtml(text)}</${tag}>`;
}

/** A table of escaped cells; columns after the first are right-aligned numbers unless `textColumns` says otherwise. */
export function htmlTable(header: readonly string[], rows: readonly (readonly string[])[], textColumns: readonly number[] = [0]): string {
  const cls = (j: number): string | undefined => (textColumns.includes(j) ? undefined : 'num');
  const head = `<tr>${header.map((h, j) => el('th', h, cls(j))).join('')}</tr>`;
  const body = rows.map((r) => `<tr>${r.map((c, j) => el('td', c, cls(j))).join('')}</tr>`).join('\n');
  return `<table>\n<thead>${head}</thead>\n<tbody>\n${body}\n</tbody>\n</table>`;
}
