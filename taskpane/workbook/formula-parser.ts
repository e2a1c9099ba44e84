/**
 * Parses the small part of Excel's formula language that Mooring's results block writes, for
 * the in-memory workbook: numbers, "text" (a quote inside doubled), TRUE and FALSE, cell and
 * range references with optional sheet ('My sheet'!$B$2:$B$781), the spill operator (J3#),
 * structured references to a table column or a run of columns (Prices[GateGasoil],
 * Prices[[Gate gasoil]], Prices[[A]:[B]], with ' escaping [ ] # and '), function calls
 * (MOOR.ENGLEGRANGER(...), IF(...)), unary minus, + - * / & and the six comparisons.
 *
 * Anything else is refused with a FormulaSyntaxError naming the place, so a test can never
 * pass on a formula that real Excel would read differently without anyone noticing.
 */

/** A parsed formula. */
export type FormulaNode =
  | { kind: 'number'; value: number }
  | { kind: 'text'; value: string }
  | { kind: 'boolean'; value: boolean }
  | { kind: 'range'; sheet: string | null; address: string; spill: boolean }
  | { kind: 'column'; table: string; first: string; last: string }
  | { kind: 'call'; name: string; args: (FormulaNode | null)[] }
  | { kind: 'unary'; op: '-' | '+'; arg: FormulaNode }
  | { kind: 'binary'; op: string; left: FormulaNode; right: FormulaNode };

/** A formula the in-memory workbook cannot read. */
export class FormulaSyntaxError extends Error {
  constructor(formula: string, at: number, what: string) {
    super(`Cannot read the formula ${formula} at character ${at + 1}: ${what}.`);
    this.name = 'FormulaSyntaxError';
  }
}

const CELL_REF = /^\$?[A-Za-z]{1,3}\$?\d{1,7}$/;
const BINARY_LEVELS: string[][] = [['=', '<>', '<=', '>=', '<', '>'], ['&'], ['+', '-'], ['*', '/']];

/** Parses a formula (with or without its leading "="). */
export function parseFormula(formula: string): FormulaNode {
  const src = formula.startsWith('=') ? formula.slice(1) : formula;
  let i = 0;
  const fail = (what: string): never => {
    throw new FormulaSyntaxError(formula, i + (formula.length - src.length), what);
  };
  const skip = () => {
    while (i < src.length && /\s/.test(src[i])) i++;
  };
  const peekOp = (ops: string[]): string | null => {
    skip();
    for (const op of ops) if (src.startsWith(op, i)) return op;
    return null;
  };

  function binary(level: number): FormulaNode {
    if (level === BINARY_LEVELS.length) return unary();
    let left = binary(level + 1);
    for (let op = peekOp(BINARY_LEVELS[level]); op !== null; op = peekOp(BINARY_LEVELS[level])) {
      i += op.length;
      left = { kind: 'binary', op, left, right: binary(level + 1) };
    }
    return left;
  }

  function unary(): FormulaNode {
    const op = peekOp(['-', '+']);
    if (op === '-' || op === '+') {
      i++;
      return { kind: 'unary', op, arg: unary() };
    }
    return primary();
  }

  function text(): string {
    let out = '';
    i++;
    for (;;) {
      if (i >= src.length) fail('a text in double quotes never closes');
      if (src[i] === '"') {
        if (src[i + 1] === '"') {
          out += '"';
          i += 2;
          continue;
        }
        i++;
        return out;
      }
      out += src[i++];
    }
  }

  /** One bracketed column name, with ' escapes; i is at its "[". */
  function bracketName(): string {
    i++;
    let out = '';
    for (;;) {
      if (i >= src.length) fail('a [ in a structured reference never closes');
      const ch = src[i];
      if (ch === "'") {
        out += src[i + 1] ?? '';
        i += 2;
        continue;
      }
      if (ch === ']') {
        i++;
        return out;
      }
      if (ch === '[') fail('an unescaped [ inside a column name');
      out += ch;
      i++;
    }
  }

  function structured(table: string): FormulaNode {
    // i is at the outer "[".
    if (src[i + 1] !== '[') {
      const name = bracketName();
      return { kind: 'column', table, first: name, last: name };
    }
    i++;
    const first = bracketName();
    let last = first;
    if (src[i] === ':') {
      i++;
      if (src[i] !== '[') fail('expected [ after : in a run of columns');
      last = bracketName();
    }
    if (src[i] !== ']') fail('expected ] to close the structured reference');
    i++;
    return { kind: 'column', table, first, last };
  }

  function reference(sheet: string | null, first: string): FormulaNode {
    if (!CELL_REF.test(first)) fail(`'${first}' is not a cell address`);
    let address = first;
    if (src[i] === ':') {
      i++;
      const m = /^\$?[A-Za-z]{1,3}\$?\d{1,7}/.exec(src.slice(i));
      if (!m) fail('expected a cell after :');
      address += `:${m![0]}`;
      i += m![0].length;
    }
    let spill = false;
    if (src[i] === '#') {
      if (address.includes(':')) fail('the spill operator # follows one cell, not a range');
      spill = true;
      i++;
    }
    return { kind: 'range', sheet, address, spill };
  }

  function args(name: string): FormulaNode {
    i++;
    const list: (FormulaNode | null)[] = [];
    skip();
    if (src[i] === ')') {
      i++;
      return { kind: 'call', name, args: list };
    }
    for (;;) {
      skip();
      list.push(src[i] === ',' || src[i] === ')' ? null : binary(0));
      skip();
      if (src[i] === ',') {
        i++;
        continue;
      }
      if (src[i] === ')') {
        i++;
        return { kind: 'call', name, args: list };
      }
      fail(`expected , or ) in the arguments of ${name}`);
    }
  }

  function primary(): FormulaNode {
    skip();
    const ch = src[i];
    if (ch === undefined) fail('the formula ends too early');
    if (ch === '(') {
      i++;
      const inner = binary(0);
      skip();
      if (src[i] !== ')') fail('expected )');
      i++;
      return inner;
    }
    if (ch === '"') return { kind: 'text', value: text() };
    if (/[0-9.]/.test(ch)) {
      const m = /^(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/.exec(src.slice(i));
      if (!m) fail('a malformed number');
      i += m![0].length;
      return { kind: 'number', value: Number(m![0]) };
    }
    if (ch === "'") {
      let j = i + 1;
      let sheet = '';
      for (;;) {
        if (j >= src.length) fail('a quoted sheet name never closes');
        if (src[j] === "'" && src[j + 1] === "'") {
          sheet += "'";
          j += 2;
          continue;
        }
        if (src[j] === "'") break;
        sheet += src[j++];
      }
      i = j + 1;
      if (src[i] !== '!') fail('expected ! after a quoted sheet name');
      i++;
      const m = /^[$A-Za-z0-9]+/.exec(src.slice(i));
      if (!m) fail('expected a cell after the sheet name');
      i += m![0].length;
      return reference(sheet, m![0]);
    }
    const m = /^[$A-Za-z_][$A-Za-z0-9_.]*/.exec(src.slice(i));
    if (!m) fail(`unexpected '${ch}'`);
    const word = m![0];
    i += word.length;
    if (src[i] === '(') return args(word.toUpperCase());
    if (src[i] === '[') return structured(word);
    if (src[i] === '!') {
      i++;
      const cell = /^[$A-Za-z0-9]+/.exec(src.slice(i));
      if (!cell) fail('expected a cell after the sheet name');
      i += cell![0].length;
      return reference(word, cell![0]);
    }
    const upper = word.toUpperCase();
    if (upper === 'TRUE' || upper === 'FALSE') return { kind: 'boolean', value: upper === 'TRUE' };
    return reference(null, word);
  }

  const node = binary(0);
  skip();
  if (i < src.length) fail(`unexpected '${src[i]}'`);
  return node;
}
