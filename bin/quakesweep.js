#!/usr/bin/env node
'use strict';
// The launcher: runs the CLI bundle (see load-cli.js) with the command line.
Promise.resolve()
  .then(() => require('./load-cli.js').compileCli().exports.main(process.argv.slice(2)))
  .then(
    (code) => {
      process.exitCode = code;
    },
    (error) => {
      process.stderr.write(`quakesweep: internal error: could not start: ${error?.message ?? error}\n`);
      process.exitCode = 1;
    },
  );
