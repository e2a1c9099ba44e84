/**
 * The Node entry of `mooring` (bundled to dist/cli/mooring.js). The only file of the command
 * line that touches Node: it wires runCli to the process. Output is written with
 * process.stdout.write and the exit code set through process.exitCode, never process.exit(),
 * which would cut off a large write to a pipe.
 */
import { readFileSync } from 'node:fs';
import { runCli } from './run-cli';

// A reader that closes the pipe early (`mooring ... | head`) is not an error of ours.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code !== 'EPIPE') throw e;
});

process.exitCode = runCli(process.argv.slice(2), {
  stdout: (s) => {
    process.stdout.write(s);
  },
  stderr: (s) => {
    process.stderr.write(s);
  },
  readFile: (path) => readFileSync(path === '-' ? 0 : path, 'utf8'),
});
