// The version printed by --version and written into reports: the CLI package's own, read at run time
// so it can never drift from what is installed.
import { readFileSync } from 'node:fs';
import { CLI_PACKAGE_ROOT } from './package-root.ts';

export function cliVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL('package.json', CLI_PACKAGE_ROOT), 'utf8')) as { version: string };
  return pkg.version;
}
