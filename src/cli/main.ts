#!/usr/bin/env node
/**
 * The Lamina command line: `check`, `span`, `lab`. Exit codes (DESIGN.md): 0 all checks meet
 * their targets; 1 at least one is below; 2 the input was refused (stderr names the field).
 */
import { readFileSync } from 'node:fs';
import { parseArgs, UsageError } from './args';
import { USAGE } from './help';
import { runCheck, runSpan } from './check';
import { runLab } from './lab';
import { InputError } from './input';

export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
  readFile: (path: string) => string;
  writeFile: (path: string, text: string) => void;
}

export function run(argv: readonly string[], io: Io): number {
  try {
    const args = parseArgs(argv);
    if (args.flags['--help'] || args.flags['-h'] || args.command === null || args.command === 'help') {
      io.out(USAGE);
      return args.command === null && !args.flags['--help'] && !args.flags['-h'] ? 2 : 0;
    }
    switch (args.command) {
      case 'check':
        return runCheck(args, io);
      case 'span':
        return runSpan(args, io);
      case 'lab':
        return runLab(args, io);
      default:
        throw new UsageError(`unknown command "${args.command}" (expected check, span, lab or help)`);
    }
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`lamina: ${e.message}\nRun "npm run lamina -- help" for usage.\n`);
      return 2;
    }
    if (e instanceof InputError) {
      io.err(`lamina: input refused: ${e.message}\n`);
      return 2;
    }
    io.err(`lamina: internal error: ${e instanceof Error ? e.message : String(e)}\n`);
    return 3;
  }
}

const isMain = process.argv[1] !== undefined && /cli[\\/]main\.(ts|js)$/.test(process.argv[1]);
if (isMain) {
  const { writeFileSync } = await import('node:fs');
  const code = run(process.argv.slice(2), {
    out: (t) => process.stdout.write(t),
    err: (t) => process.stderr.write(t),
    readFile: (path) => readFileSync(path, 'utf8'),
    writeFile: (path, text) => writeFileSync(path, text, 'utf8'),
  });
  process.exitCode = code;
}
