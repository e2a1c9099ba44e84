/**
 * Names from the data, shortened for a terminal. A column header can be any length (a file
 * with a 100,000-character header is still a file), and a name printed whole in a message or
 * a table buries everything else on the screen and stretches every column to its width. On a
 * terminal a name longer than SHOWN_NAME_LIMIT characters shows its start and its end around
 * "...", and the count of its characters; JSON always keeps the full name.
 *
 * The command line applies this once (run-command-line.ts): for a report on the terminal the
 * command runs on the shortened names (so tables are laid out for them and every sentence the
 * engine writes uses them), and every message on standard error has the long names it holds
 * replaced.
 */

/** Longest name shown whole on a terminal, in characters. */
export const SHOWN_NAME_LIMIT = 60;

const HEAD = 24;
const TAIL = 8;

/** The name as a terminal shows it: whole up to SHOWN_NAME_LIMIT characters, else its start, "...", its end and its length. */
export function shownName(name: string): string {
  const chars = Array.from(name); // whole code points: never half of a surrogate pair
  if (chars.length <= SHOWN_NAME_LIMIT) return name;
  // No comma in the count: the shortened name travels inside comma-separated lists of names.
  return `${chars.slice(0, HEAD).join('')}...${chars.slice(-TAIL).join('')} (${chars.length} characters)`;
}

/**
 * The shortened form of each long name among `names`, distinct from one another and from every
 * name given (two long names that share their start and end get "#2", "#3" after the first).
 */
export function shownNames(names: Iterable<string>): Map<string, string> {
  const all = new Set(names);
  const taken = new Set(all);
  const out = new Map<string, string>();
  for (const name of all) {
    if (Array.from(name).length <= SHOWN_NAME_LIMIT) continue;
    const base = shownName(name);
    let shown = base;
    for (let k = 2; taken.has(shown); k++) shown = `${base} #${k}`;
    taken.add(shown);
    out.set(name, shown);
  }
  return out;
}

/** The text with every long name of the map replaced by its shortened form (the longest names first). */
export function withShownNames(text: string, names: ReadonlyMap<string, string>): string {
  if (names.size === 0) return text;
  let out = text;
  for (const [name, shown] of [...names].sort((a, b) => b[0].length - a[0].length)) out = out.split(name).join(shown);
  return out;
}

/** Runs of this many characters or more without a space are cut in messages even when not known as names. */
const LONG_WORD = 200;

/**
 * A one-line message for standard error: the known long names shortened, then any other run of
 * LONG_WORD or more characters without a space (a name quoted by a reader that had no table to
 * name yet) shortened the same way.
 */
export function shownMessage(message: string, names: ReadonlyMap<string, string>): string {
  return withShownNames(message, names).replace(new RegExp(`\\S{${LONG_WORD},}`, 'gu'), (word) => shownName(word));
}
