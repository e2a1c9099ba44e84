/** `runCli`: the mooring command line with its full command table, for main.ts and for tests. */
import { MOORING_COMMANDS } from './commands';
import { runCommandLine, type CliIo } from './run-command-line';

/** Runs `mooring` with these argument words (without the program name); returns the exit code. */
export function runCli(argv: string[], io: CliIo): number {
  return runCommandLine(argv, io, MOORING_COMMANDS);
}
