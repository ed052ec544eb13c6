#!/usr/bin/env node
/** The `lamina` executable (package `bin`): runs the command line with the process's streams. */
import { processIo, run } from './main';

// A reader that stops early (`lamina check … | head`) closes the pipe: stop quietly.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});
process.exitCode = await run(process.argv.slice(2), processIo());
