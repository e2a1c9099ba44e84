/**
 * The note a block keeps with its workbook-level name (the name's comment in Excel): where
 * its data came from and which pair it shows, so the block can be found and refreshed from
 * its name alone. Compact JSON under Excel's 255-character limit for a name's comment; when
 * long names would pass the limit, the reserved spill ranges (which can be worked out again)
 * are left out first, then the address of a table (which the table's name replaces).
 */

/** What a block's note records. */
export interface BlockNote {
  sheet: string;
  /** The source region's address when written. */
  address: string;
  table: string | null;
  a: string;
  b: string;
  reserved: string[];
  /**
   * The analysis the block shows, so a refresh runs the same one: the preparation of the prices
   * (addin/series/preparation.ts words) and the report's choices. Absent in notes written
   * before they were recorded (a refresh then uses the defaults).
   */
  analysis?: BlockAnalysis;
}

/** The choices a block was written with. */
export interface BlockAnalysis {
  preparation: string;
  alpha: number;
  deterministic: string;
  lagRule: string;
  johansenCase: string;
  /** The test that decided the levels step of each order ('adf' or 'dfgls'); 'adf' in notes written before it was recorded. */
  unitRootTest: string;
}

/** Longest comment Excel keeps on a name. */
export const NOTE_LIMIT = 255;

const KIND = 'mooring-block-1';

/** The note as text, within the limit where it can be. */
export function encodeBlockNote(note: BlockNote): string {
  const n = note.analysis;
  const full = {
    k: KIND, s: note.sheet, r: note.address, t: note.table, a: note.a, b: note.b, x: note.reserved,
    ...(n ? { p: n.preparation, o: [n.alpha, n.deterministic, n.lagRule, n.johansenCase, n.unitRootTest] } : {}),
  };
  const tries = [full, { ...full, x: [] as string[] }, ...(note.table ? [{ ...full, x: [] as string[], r: '' }] : [])];
  for (const t of tries) {
    const text = JSON.stringify(t);
    if (text.length <= NOTE_LIMIT) return text;
  }
  return JSON.stringify(tries[tries.length - 1]);
}

/** The note read back, or null when the text is not a block note. */
export function decodeBlockNote(text: string | null | undefined): BlockNote | null {
  if (!text) return null;
  let o: Record<string, unknown>;
  try {
    o = JSON.parse(text) as Record<string, unknown>;
  } catch {
    return null;
  }
  if (o === null || typeof o !== 'object' || o.k !== KIND || typeof o.s !== 'string' || typeof o.a !== 'string' || typeof o.b !== 'string') return null;
  return {
    sheet: o.s,
    address: typeof o.r === 'string' ? o.r : '',
    table: typeof o.t === 'string' ? o.t : null,
    a: o.a,
    b: o.b,
    reserved: Array.isArray(o.x) ? o.x.filter((v): v is string => typeof v === 'string') : [],
    ...analysisOf(o),
  };
}

function analysisOf(o: Record<string, unknown>): { analysis?: BlockAnalysis } {
  const c = o.o;
  if (typeof o.p !== 'string' || !Array.isArray(c) || (c.length !== 4 && c.length !== 5) || typeof c[0] !== 'number' || !c.slice(1).every((v) => typeof v === 'string')) return {};
  return { analysis: { preparation: o.p, alpha: c[0], deterministic: c[1] as string, lagRule: c[2] as string, johansenCase: c[3] as string, unitRootTest: (c[4] as string | undefined) ?? 'adf' } };
}
