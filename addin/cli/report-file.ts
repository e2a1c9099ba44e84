/**
 * Writing the HTML report without destroying someone's file. `report --out PATH` replaces PATH
 * only when nothing is there or when what is there is a report Mooring wrote (it carries
 * REPORT_MARKER in its head); any other file is refused unless --force is given, because the
 * command cannot know what the file held and a report is easy to write elsewhere.
 *
 * Reports written before the marker existed are still recognised by their closing line
 * (LEGACY_FOOTER), so rerunning the same command keeps working. Only the first and last few
 * kilobytes are read: the marker sits at the top of the head, the legacy line at the end of
 * the body.
 *
 * Node's fs is used here because the runner's io has no writer; the command line is bundled
 * for Node only.
 */
import { closeSync, openSync, readSync, statSync, writeFileSync } from 'node:fs';
import { MooringInputError } from '../errors';
import { REPORT_MARKER } from './render/diagnostic-html';

/** The closing line of reports written before the marker existed. */
const LEGACY_FOOTER = 'Mooring pairwise diagnostic, report version';

/** Bytes read from each end of an existing file when looking for the marker. */
const PEEK_BYTES = 8192;

/** What lies at a path, as far as writing a report there is concerned. */
export type ExistingFile = 'none' | 'mooring-report' | 'other' | 'unreadable';

/** Whether a file exists at the path and, if so, whether Mooring wrote it. */
export function existingFile(path: string): ExistingFile {
  // stat first: opening a named pipe to read would wait for a writer that never comes.
  let size: number;
  try {
    const stat = statSync(path);
    if (!stat.isFile()) return 'other';
    size = stat.size;
  } catch (e) {
    const code = (e as { code?: unknown } | null)?.code;
    return code === 'ENOENT' ? 'none' : 'unreadable';
  }
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch {
    return 'unreadable';
  }
  try {
    const head = Buffer.alloc(Math.min(PEEK_BYTES, size));
    readSync(fd, head, 0, head.length, 0);
    const tail = Buffer.alloc(Math.min(PEEK_BYTES, size));
    readSync(fd, tail, 0, tail.length, size - tail.length);
    const text = `${head.toString('utf8')}\n${tail.toString('utf8')}`;
    return text.includes(REPORT_MARKER) || text.includes(LEGACY_FOOTER) ? 'mooring-report' : 'other';
  } catch {
    return 'unreadable';
  } finally {
    closeSync(fd);
  }
}

/**
 * Refuses an --out path that holds a file Mooring did not write, unless `force`. Called
 * before the diagnostic runs, so a refusal costs nothing.
 */
export function checkReportPath(path: string, force: boolean): void {
  if (force) return;
  const found = existingFile(path);
  if (found === 'other') {
    throw new MooringInputError(
      `'${path}' already exists and is not a report Mooring wrote, so it was left alone: choose another --out path, or add --force to replace it.`);
  }
  if (found === 'unreadable') {
    throw new MooringInputError(
      `'${path}' already exists but cannot be read, so Mooring cannot tell whether it wrote it: choose another --out path, or add --force to replace it.`);
  }
}

/** Writes the report, turning a failure into a message that names the path. */
export function writeReportFile(path: string, html: string): void {
  try {
    writeFileSync(path, html, 'utf8');
  } catch (e) {
    const code = (e as { code?: unknown } | null)?.code;
    const why = code === 'ENOENT' ? 'the folder does not exist' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'EISDIR' ? 'it is a folder' : e instanceof Error ? e.message : String(e);
    throw new MooringInputError(`Cannot write the HTML report to '${path}': ${why}; choose another --out path.`);
  }
}
