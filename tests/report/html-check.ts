/**
 * A small well-formedness check of the HTML report: every tag closes in order (void elements
 * and self-closed SVG elements excepted), nothing but tags uses '<', and attribute values are
 * quoted. Enough to catch a broken renderer or unescaped data; not a full HTML parser.
 */

const VOID = new Set(['meta', 'br', 'hr', 'img', 'input', 'link', 'area', 'base', 'col', 'source', 'wbr']);

/** The problems found (empty when the page passes). */
export function htmlProblems(html: string): string[] {
  const problems: string[] = [];
  const body = html.replace(/^<!DOCTYPE html>\s*/i, '').replace(/<style>[\s\S]*?<\/style>/g, '<style></style>');
  const stack: string[] = [];
  const tag = /<(\/?)([a-zA-Z][a-zA-Z0-9-]*)((?:\s+[a-zA-Z][a-zA-Z0-9:-]*="[^"<>]*")*)\s*(\/?)>/g;
  let last = 0;
  let m: RegExpExecArray | null;
  while ((m = tag.exec(body)) !== null) {
    const between = body.slice(last, m.index);
    if (between.includes('<') || between.includes('>')) problems.push(`stray < or > before offset ${m.index}: ${JSON.stringify(between.slice(0, 60))}`);
    last = tag.lastIndex;
    const [, closing, rawName, , selfClosed] = m;
    const name = rawName.toLowerCase();
    if (closing) {
      const open = stack.pop();
      if (open !== name) problems.push(`</${name}> closes <${open ?? 'nothing'}> at offset ${m.index}`);
    } else if (!selfClosed && !VOID.has(name)) {
      stack.push(name);
    }
  }
  const tail = body.slice(last);
  if (tail.includes('<') || tail.includes('>')) problems.push(`stray < or > after the last tag: ${JSON.stringify(tail.slice(0, 60))}`);
  if (stack.length > 0) problems.push(`unclosed: ${stack.join(', ')}`);
  return problems;
}
