import { readFileSync } from 'node:fs';

/** package.json's version; the path holds from src/base/, dist/base/ and the bundle's dist/cli/. */
export const VERSION: string = JSON.parse(
  readFileSync(new URL('../../package.json', import.meta.url), 'utf8'),
).version;
