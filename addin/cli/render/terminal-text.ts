/**
 * Text on its way to a terminal, made harmless. Column names and cell texts come from the
 * user's file, and a file can hold control characters: ESC starts the sequences that recolour
 * the screen, retitle the window or move the cursor, CR overwrites a line, and the C1 codes
 * (U+0080 to U+009F; 0x9B is a one-byte CSI) do the same on terminals that honour them.
 * Direction overrides (U+202A to U+202E, U+2066 to U+2069) reorder what a line appears to say.
 *
 * Every such character is shown as a visible escape instead (ESC as \x1b, U+202E as \u202e),
 * so the reader sees that the name holds it and nothing on the screen changes. The runner
 * passes the whole terminal report and every message on standard error through here, once,
 * just before writing: no renderer has to remember it. JSON output keeps the true text and is
 * made safe by jsonText (JSON's own \u escapes, so it parses to the same strings).
 */

/**
 * Characters never written raw: C0 controls (line feed is handled by the caller's choice), DEL,
 * C1 controls, zero-width and direction marks, line and paragraph separators, direction
 * embeddings, overrides and isolates, the byte-order mark and the interlinear annotation marks.
 */
const UNSAFE = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff\ufff9-\ufffb]/g;

/** The same set with the line feed. */
const UNSAFE_ON_ONE_LINE = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff\ufff9-\ufffb]/g;

function visible(c: string): string {
  const code = c.charCodeAt(0);
  return code < 0x100 ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
}

/**
 * The text with every control character shown as a visible escape. Line feeds are kept unless
 * `oneLine` is set (a message on standard error is one line).
 */
export function terminalText(text: string, oneLine = false): string {
  return text.replace(oneLine ? UNSAFE_ON_ONE_LINE : UNSAFE, visible);
}

/** Characters JSON.stringify leaves raw that a terminal may still act on (it escapes only U+0000 to U+001F). */
const JSON_RAW = /[\u007f-\u009f\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff\ufff9-\ufffb]/g;

/**
 * JSON text with the characters of terminalText's set that JSON.stringify leaves raw written as
 * \u escapes. Outside strings JSON text is plain ASCII, so every such character sits inside a
 * string, where the escape reads back as the same character: the output parses to the same value.
 */
export function jsonText(json: string): string {
  return json.replace(JSON_RAW, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
