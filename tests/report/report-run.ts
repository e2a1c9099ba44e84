/** Runs `mooring report` in-process against real files, for the report's tests. */
import { readFileSync } from 'node:fs';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { runCommandLine } from '../../addin/cli/run-command-line';
import type { CliRun } from '../cli/cli-harness';

/** Runs mooring with these words; files come from `files` first, then from disk. */
export function runMooring(argv: string[], files: Record<string, string> = {}): CliRun {
  let stdout = '';
  let stderr = '';
  const code = runCommandLine(argv, {
    stdout: (s) => { stdout += s; },
    stderr: (s) => { stderr += s; },
    readFile: (path) => (path in files ? files[path] : readFileSync(path, 'utf8')),
  }, MOORING_COMMANDS);
  return { code, stdout, stderr };
}

/** The demo file, relative to the repository root (vitest runs there). */
export const DEMO_CSV = 'addin/demo/data/quennel-delta.csv';

/** Where the report tests write HTML files (git-ignored). */
export const ARTIFACTS = 'test-artifacts/report';
