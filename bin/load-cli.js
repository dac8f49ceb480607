'use strict';
// Loads the CLI bundle (dist/cli/quakesweep.cjs, by scripts/build-cli.mjs) with the V8 code cache
// made beside it. CommonJS (bin/package.json), which starts without Node's ES module loader.
const { existsSync, readFileSync, statSync } = require('node:fs');
const { createRequire } = require('node:module');
const { dirname, join } = require('node:path');
const { Script } = require('node:vm');

const BUNDLE = join(__dirname, '..', 'dist', 'cli', 'quakesweep.cjs');
const CACHE = `${BUNDLE}.cache`;

/**
 * Compile and run the bundle (exports: those of dist/cli/main.js). With `cache`, the code cache is
 * given to V8 when no older than the bundle (V8 checks only the Node version, flags and source
 * length, and refuses a cache that does not fit). `script` can make a cache.
 */
function compileCli({ cache = true } = {}) {
  const source = readFileSync(BUNDLE, 'utf8');
  const fresh = cache && existsSync(CACHE) && statSync(CACHE).mtimeMs >= statSync(BUNDLE).mtimeMs;
  const cachedData = fresh ? readFileSync(CACHE) : undefined;
  // The wrapper of a CommonJS module, on the bundle's first line so that line numbers hold.
  const script = new Script(`(function (exports, require, module, __filename, __dirname) {${source}\n})`, {
    filename: BUNDLE,
    cachedData,
  });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(BUNDLE), module, BUNDLE, dirname(BUNDLE));
  return { exports: module.exports, script };
}

module.exports = { BUNDLE, CACHE, compileCli };
