// Bundles the command-line program into one CommonJS file, dist/cli/quakesweep.cjs, and makes
// V8's code cache for it, dist/cli/quakesweep.cjs.cache. Runs after tsc in `npm run build`; the
// bundle is made from tsc's output (dist/cli/main.js), so it holds the same code, and it is the
// only way the launcher (bin/load-cli.js) runs the program. Why: one file loaded with a code cache
// made after a run of the command skips resolving some forty ES modules and compiling every
// function that run used.
//
// The cache holds V8's bytecode for this Node version and V8 flags; V8 checks both and the
// source's length, and a cache that does not fit is refused and the file compiled as usual (the
// program's behaviour does not depend on it, only its start-up time). Since V8 does not compare
// the source itself, the old cache is removed before the bundle is written, and the launcher
// takes a cache only if it is at least as new as the bundle.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';

const root = new URL('../', import.meta.url).pathname;
const require = createRequire(import.meta.url);
const { BUNDLE, CACHE, compileCli } = require('../bin/load-cli.js');

/**
 * commander requires node:child_process when it loads, for subcommands that are programs of their
 * own, which quakesweep has none of; loading it loads net and dgram too. In the bundle commander
 * gets it on first use instead.
 */
const lazyChildProcess = {
  name: 'lazy-child-process',
  setup(plugin) {
    plugin.onResolve({ filter: /^node:child_process$/ }, (args) =>
      args.importer.includes(`${'/node_modules/'}commander/`)
        ? { path: 'lazy-child-process', namespace: 'quakesweep' }
        : undefined,
    );
    plugin.onLoad({ filter: /^lazy-child-process$/, namespace: 'quakesweep' }, () => ({
      contents:
        "let real;\nmodule.exports = new Proxy({}, { get: (_, key) => (real ??= require('node:child_process'))[key] });\n",
      loader: 'js',
    }));
  },
};

// The bundle's own settings, shared by the worker bundles.
const common = {
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  // jsdom (large, loaded with the first figure) stays in node_modules and is required where it was. d3-scale and d3-shape are
  // ES modules only, which Node 20 cannot require: they go into the bundle.
  external: ['jsdom'],
  // Every module of a bundle sees the bundle's own URL: the paths the code finds from it
  // (workerScript, recordsFolder) are written to hold from there as well.
  define: { 'import.meta.url': '__bundleUrl' },
  banner: { js: "const __bundleUrl = require('node:url').pathToFileURL(__filename).href;" },
  plugins: [lazyChildProcess],
  // Without blanks and comments (names kept): a smaller file to read and to scan for the functions
  // the cache does not hold.
  minifyWhitespace: true,
  minifySyntax: true,
  logLevel: 'warning',
  legalComments: 'eof',
};
rmSync(CACHE, { force: true });
await build({ ...common, entryPoints: [join(root, 'dist/cli/main.js')], outfile: BUNDLE });
// The worker threads of the CLI's pools, bundled too: a worker of one CommonJS file is ready
// sooner than one that loads the ES modules of dist/ (workerScript in threads/team.ts picks these
// when it is called from the bundle).
await build({
  ...common,
  entryPoints: ['threads/pool-worker.js', 'threads/batch-worker.js', 'threads/ductility-worker.js'].map(
    (file) => join(root, 'dist', file),
  ),
  outdir: join(root, 'dist/cli/workers'),
  entryNames: '[name]',
  outExtension: { '.js': '.cjs' },
});

// The code cache, made after a run of the main job on the invented demo record: V8 caches the
// functions compiled so far, so those the run used are not compiled again by later runs.
const { exports, script } = compileCli({ cache: false });
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-build-'));
try {
  const code = await exports.main([
    'spectrum',
    join(root, 'records/marrowby-h1.csv'),
    '--units',
    'g',
    '--damping',
    '2%,5%',
    '--out',
    join(folder, 'spectrum.json'),
  ]);
  if (code !== 0) throw new Error(`the warm-up run of the bundle exited with ${code}`);
} finally {
  rmSync(folder, { recursive: true, force: true });
}
writeFileSync(CACHE, script.createCachedData());
