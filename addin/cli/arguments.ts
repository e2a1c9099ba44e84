/**
 * Splits a command's argument words into positionals (the CSV file) and options, checked
 * against the command's option table. Options are written `--name value`, `--name=value`,
 * or `--name` alone for a switch; `--` ends the options (for a file name that starts with a
 * dash). Every mistake is a MooringInputError naming the option and what would work.
 */
import { MooringInputError } from '../errors';

/** One option a command accepts. */
export interface OptionSpec {
  /** Name without the leading dashes, lower case: "series", "max-lags". */
  name: string;
  /** Placeholder for the value in help ("NAME", "N|aic|bic|tstat"); absent for a switch. */
  value?: string;
  /** One line of help. */
  help: string;
}

/** The words of a command line, sorted. */
export interface ParsedArguments {
  positionals: string[];
  /** Options that take a value, by name. */
  values: Map<string, string>;
  /** Switches given. */
  switches: Set<string>;
}

/** Parses argument words against the option table; `command` names the command in messages. */
export function parseArguments(words: readonly string[], specs: readonly OptionSpec[], command: string): ParsedArguments {
  const byName = new Map(specs.map((s) => [s.name, s]));
  const parsed: ParsedArguments = { positionals: [], values: new Map(), switches: new Set() };
  let optionsEnded = false;
  for (let i = 0; i < words.length; i++) {
    const word = words[i];
    if (optionsEnded || !word.startsWith('-') || word === '-') {
      parsed.positionals.push(word);
      continue;
    }
    if (word === '--') {
      optionsEnded = true;
      continue;
    }
    const eq = word.indexOf('=');
    const rawName = (eq >= 0 ? word.slice(0, eq) : word).replace(/^--?/, '').toLowerCase();
    const spec = byName.get(rawName);
    if (!spec) {
      const near = closestWord(rawName, [...byName.keys()]);
      const hint = near ? ` (did you mean --${near}?)` : '';
      throw new MooringInputError(
        `Unknown option ${eq >= 0 ? word.slice(0, eq) : word} for ${command}${hint}; its options are ${specs.map((s) => `--${s.name}`).join(', ')}.`);
    }
    if (parsed.values.has(spec.name) || parsed.switches.has(spec.name)) {
      throw new MooringInputError(`--${spec.name} is given more than once: give it once.`);
    }
    if (spec.value === undefined) {
      if (eq >= 0) throw new MooringInputError(`--${spec.name} is a switch and takes no value: write --${spec.name} alone.`);
      parsed.switches.add(spec.name);
      continue;
    }
    let value: string | undefined;
    if (eq >= 0) value = word.slice(eq + 1);
    else if (i + 1 < words.length && !words[i + 1].startsWith('--')) value = words[++i];
    if (value === undefined || value === '') {
      throw new MooringInputError(`--${spec.name} needs a value: --${spec.name} ${spec.value}.`);
    }
    parsed.values.set(spec.name, value);
  }
  return parsed;
}

/**
 * The candidate closest to a mistyped word, or null when none is close: a candidate the word
 * begins, or one within a third of the word's length in edits (at least one edit).
 */
export function closestWord(word: string, candidates: readonly string[]): string | null {
  const allowed = Math.max(1, Math.floor(word.length / 3));
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const d = c.startsWith(word) && word.length >= 2 ? 0.5 : editDistance(word, c);
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  return bestDistance <= allowed ? best : null;
}

/**
 * Edit distance with adjacent transpositions (optimal string alignment): the fewest
 * insertions, deletions, substitutions and swaps of neighbours turning a into b.
 */
function editDistance(a: string, b: string): number {
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) => Array.from({ length: b.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)));
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      d[i][j] = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
    }
  }
  return d[a.length][b.length];
}
