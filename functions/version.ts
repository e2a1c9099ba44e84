// The version string that MOOR.VERSION() reports: the "version" field of package.json,
// inlined by the bundler, so the add-in and the command line always agree.
import packageJson from '../package.json';

export function addinVersion(): string {
  return packageJson.version;
}
