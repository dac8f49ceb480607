import { readFileSync } from 'node:fs';

/**
 * The tool's version, printed by --version and in every report: package.json's own, read once.
 * The path holds from src/base/, dist/base/ and the CLI bundle dist/cli/, all two folders below
 * the package's root.
 */
export const VERSION: string = JSON.parse(
  readFileSync(new URL('../../package.json', import.meta.url), 'utf8'),
).version;
