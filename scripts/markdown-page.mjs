// Turns the Markdown our generators write into one self-contained HTML page.
//
// Only the few forms scripts/make-function-docs.mjs writes are understood: headings, paragraphs,
// "- " lists (continued by lines indented two spaces), pipe tables, fenced code, a line
// `<a id="x"></a>` naming the heading after it, and inline `code`, **strong**, *emphasis* and
// [links](target). Anything else is refused rather than shown wrongly, so a change to the
// generator that this page cannot show fails the build. Every piece of text is escaped.

const ANCHOR_LINE = /^<a id="([A-Za-z][\w-]*)"><\/a>$/;
const HEADING = /^(#{1,6}) (.+)$/;
const FENCE = /^```\s*$/;

/** Text with the characters HTML gives meaning to escaped. */
export function escapeHtml(text) {
  return String(text).replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** One line of inline Markdown as HTML. */
export function inlineHtml(text) {
  // Code spans first: their content is shown as written.
  const pieces = String(text).split(/(`[^`]+`)/);
  return pieces
    .map((piece) => {
      if (/^`[^`]+`$/.test(piece)) return `<code>${escapeHtml(piece.slice(1, -1).replace(/\\\|/g, '|'))}</code>`;
      return escapeHtml(piece.replace(/\\\|/g, '|'))
        .replace(/\[([^\]]+)\]\(([^)\s]+)\)/g, (_m, label, href) => `<a href="${href}">${label}</a>`)
        .replace(/\*\*(\S(?:[^*]*\S)?)\*\*/g, '<strong>$1</strong>')
        .replace(/(^|[\s(])\*(\S(?:[^*]*\S)?)\*(?=[\s.,;:)]|$)/g, '$1<em>$2</em>');
    })
    .join('');
}

/** The cells of one table row, split at bars that are not escaped as \|. */
function tableCells(line) {
  const inner = line.trim().replace(/^\|/, '').replace(/\|$/, '');
  return inner.split(/(?<!\\)\|/).map((cell) => cell.trim());
}

function isBlockStart(line) {
  return HEADING.test(line) || FENCE.test(line) || ANCHOR_LINE.test(line) || line.startsWith('|') || line.startsWith('- ');
}

/**
 * The body HTML of a Markdown text in the subset above.
 * @param {string} markdown
 * @returns {{ html: string, title: string | undefined, ids: string[] }}
 */
export function markdownToHtml(markdown) {
  const lines = markdown.replace(/\r\n/g, '\n').split('\n');
  const out = [];
  const ids = [];
  let title;
  let pendingId;
  let i = 0;
  const where = () => `line ${i + 1}`;

  while (i < lines.length) {
    const line = lines[i];
    if (line.trim() === '') {
      i += 1;
      continue;
    }
    if (pendingId !== undefined && !HEADING.test(line)) {
      throw new Error(`${where()}: the anchor "${pendingId}" must stand right before a heading`);
    }
    const anchor = ANCHOR_LINE.exec(line);
    if (anchor) {
      pendingId = anchor[1];
      i += 1;
      continue;
    }
    const heading = HEADING.exec(line);
    if (heading) {
      const level = heading[1].length;
      const idAttr = pendingId === undefined ? '' : ` id="${pendingId}"`;
      if (pendingId !== undefined) ids.push(pendingId);
      pendingId = undefined;
      if (level === 1 && title === undefined) title = heading[2].replace(/\\\|/g, '|');
      out.push(`<h${level}${idAttr}>${inlineHtml(heading[2])}</h${level}>`);
      i += 1;
      continue;
    }
    if (FENCE.test(line)) {
      const start = i;
      const code = [];
      i += 1;
      while (i < lines.length && !FENCE.test(lines[i])) code.push(lines[i++]);
      if (i >= lines.length) throw new Error(`line ${start + 1}: a code block is never closed`);
      i += 1;
      out.push(`<pre><code>${escapeHtml(code.join('\n'))}</code></pre>`);
      continue;
    }
    if (line.startsWith('|')) {
      const rows = [];
      while (i < lines.length && lines[i].startsWith('|')) rows.push(lines[i++]);
      if (rows.length < 2 || !/^\|(\s*:?-+:?\s*\|)+$/.test(rows[1].trim())) {
        throw new Error(`line ${i - rows.length + 1}: a table needs a header row and a |---| row under it`);
      }
      const header = tableCells(rows[0]);
      const body = rows.slice(2).map(tableCells);
      for (const [k, row] of body.entries()) {
        if (row.length !== header.length) {
          throw new Error(`line ${i - body.length + k + 1}: a table row has ${row.length} cells, its header ${header.length}`);
        }
      }
      out.push(
        '<table>',
        `<thead><tr>${header.map((c) => `<th>${inlineHtml(c)}</th>`).join('')}</tr></thead>`,
        '<tbody>',
        ...body.map((row) => `<tr>${row.map((c) => `<td>${inlineHtml(c)}</td>`).join('')}</tr>`),
        '</tbody>',
        '</table>',
      );
      continue;
    }
    if (line.startsWith('- ')) {
      const items = [];
      while (i < lines.length && (lines[i].startsWith('- ') || (lines[i].startsWith('  ') && lines[i].trim() !== ''))) {
        if (lines[i].startsWith('- ')) items.push(lines[i].slice(2).trim());
        else items[items.length - 1] += ` ${lines[i].trim()}`;
        i += 1;
      }
      out.push('<ul>', ...items.map((item) => `<li>${inlineHtml(item)}</li>`), '</ul>');
      continue;
    }
    const paragraph = [];
    while (i < lines.length && lines[i].trim() !== '' && (paragraph.length === 0 || !isBlockStart(lines[i]))) {
      if (/^\s/.test(lines[i])) throw new Error(`line ${i + 1}: an indented line outside a list`);
      paragraph.push(lines[i++].trim());
    }
    out.push(`<p>${inlineHtml(paragraph.join(' '))}</p>`);
  }
  if (pendingId !== undefined) throw new Error(`the anchor "${pendingId}" at the end names no heading`);
  return { html: out.join('\n'), title, ids };
}

/** Our own plain styling: readable measure, quiet tables, code set apart. */
const STYLE = `
  :root { color-scheme: light; }
  body { margin: 0; background: #fbfbf9; color: #1d2327; font: 16px/1.55 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; }
  main { max-width: 52rem; margin: 0 auto; padding: 1.5rem 1.25rem 4rem; }
  h1 { font-size: 1.8rem; margin: 0.5rem 0 1rem; }
  h2 { font-size: 1.3rem; margin: 2.25rem 0 0.75rem; padding-bottom: 0.25rem; border-bottom: 1px solid #d5d9d4; }
  h3 { font-size: 1.1rem; margin: 2.5rem 0 0.5rem; padding-top: 0.75rem; border-top: 3px solid #2f6f73; }
  h3:target { background: #e7f1ef; }
  a { color: #1f5e8c; }
  code { font-family: ui-monospace, "Cascadia Mono", Consolas, Menlo, monospace; font-size: 0.92em; background: #eef0ec; padding: 0.05em 0.3em; border-radius: 3px; }
  pre { background: #eef0ec; padding: 0.6rem 0.8rem; overflow-x: auto; border-radius: 4px; }
  pre code { background: none; padding: 0; }
  table { border-collapse: collapse; width: 100%; margin: 0.75rem 0; font-size: 0.95rem; }
  th, td { border: 1px solid #d5d9d4; padding: 0.35rem 0.55rem; text-align: left; vertical-align: top; }
  th { background: #eef0ec; }
  td:first-child { white-space: nowrap; }
  ul { padding-left: 1.3rem; }
  @media print { h3 { break-after: avoid; } }
`;

/**
 * A complete page: the body from markdownToHtml, the title from its first heading, the styling
 * inline and a content security policy that lets the page load nothing at all.
 * @param {string} markdown
 * @returns {{ page: string, ids: string[] }}
 */
export function markdownPage(markdown) {
  const { html, title, ids } = markdownToHtml(markdown);
  if (title === undefined) throw new Error('the page has no top-level heading to take its title from');
  const page = [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(title)}</title>`,
    `<style>${STYLE}</style>`,
    '</head>',
    '<body>',
    '<main>',
    html,
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
  return { page, ids };
}
