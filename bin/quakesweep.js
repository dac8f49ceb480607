#!/usr/bin/env node
'use strict';
// The launcher: loads the CLI (see load-cli.js) and runs it with the command line.
require('./load-cli.js')
  .loadMain()
  .then((main) => main(process.argv.slice(2)))
  .then(
    (code) => {
      process.exitCode = code;
    },
    (error) => {
      process.stderr.write(`quakesweep: internal error: could not start: ${error?.message ?? error}\n`);
      process.exitCode = 1;
    },
  );
