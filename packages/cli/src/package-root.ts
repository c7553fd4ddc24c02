// Where the @bulkhead/cli package lies on disk. This file sits one folder below the package root both
// as source (src/package-root.ts) and once bundled into the command (dist/bulkhead.js), so the same
// relative URL holds in tests, which read the sources, and in the built bin.
import { fileURLToPath } from 'node:url';

export const CLI_PACKAGE_ROOT = new URL('../', import.meta.url);

/** A path inside the repository that holds this package (packages/cli is two folders below it). */
export function repositoryPath(relative: string): string {
  return fileURLToPath(new URL(`../../${relative}`, CLI_PACKAGE_ROOT));
}
