import { spawnSync } from 'node:child_process';
import { createRequire } from 'node:module';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { besidesSuccess } from '../helpers/run-cli.js';

// The launcher runs the CLI bundle, its only way to run the program, with the V8 code cache made
// at build time (bin/load-cli.js, scripts/build-cli.mjs): the cache must fit the bundle and this
// Node, or every run would compile the bundle from scratch (the program would still work, only
// start slower).
const root = resolve(import.meta.dirname, '../..');
const launcher = createRequire(import.meta.url)(join(root, 'bin', 'load-cli.js')) as {
  compileCli(options?: { cache?: boolean }): {
    exports: { main: unknown };
    script: { cachedDataRejected?: boolean };
  };
};

describe('the launcher', () => {
  it("hands V8 the bundle's code cache, and V8 takes it", () => {
    // In a fresh process, as a run of the command line is (this one has run other tests).
    const check = spawnSync(
      process.execPath,
      [
        '-e',
        `const { script, exports } = require(${JSON.stringify(join(root, 'bin', 'load-cli.js'))}).compileCli();
         process.stdout.write(JSON.stringify({ rejected: script.cachedDataRejected, main: typeof exports.main }));`,
      ],
      { encoding: 'utf8' },
    );
    expect(besidesSuccess(check.stderr)).toBe('');
    expect(JSON.parse(check.stdout)).toEqual({ rejected: false, main: 'function' });
  });

  it('compiles the bundle without the cache too, to the same program', () => {
    const { exports, script } = launcher.compileCli({ cache: false });
    expect(typeof exports.main).toBe('function');
    expect(script.cachedDataRejected).toBeUndefined();
  });
});
