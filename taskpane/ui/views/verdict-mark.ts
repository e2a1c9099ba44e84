/**
 * The mark beside a verdict: a word that carries the meaning on its own, and a tone the
 * renderer may colour. Colour never carries a verdict alone: the word is always shown.
 */

/** Tone of a mark, for the renderer's colour. */
export type Tone = 'yes' | 'no' | 'unsure';

/** A verdict mark: the word shown and its tone. */
export interface VerdictMark {
  word: string;
  tone: Tone;
}

/** Makes a mark. */
export function mark(word: string, tone: Tone): VerdictMark {
  return { word, tone };
}
