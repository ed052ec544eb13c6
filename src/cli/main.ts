/**
 * The Lamina command line: `check`, `span`, `support`, `lab`, `openings`. Exit codes (src/cli/exit-codes.ts,
 * DESIGN.md): 0 all checks meet their targets; 1 at least one is below; 2 the input was refused
 * or an output could not be written (stderr names the field, option or path); 3 an internal
 * error (a bug). Each command's module is imported when it runs, so `--help` loads almost
 * nothing and no command loads what another needs.
 */
import { parseArgs, UsageError } from './args';
import { EXIT_INTERNAL, EXIT_MEETS, EXIT_REFUSED, type ExitCode } from './exit-codes';
import { USAGE } from './help';
import { InputError } from './input';
import type { Io } from './io';
import { OutputError } from './output';

export type { Io } from './io';
export { processIo } from './io';

async function dispatch(command: string, args: ReturnType<typeof parseArgs>, io: Io): Promise<ExitCode> {
  switch (command) {
    case 'check':
      return (await import('./check')).runCheck(args, io);
    case 'span':
      return (await import('./check')).runSpan(args, io);
    case 'support':
      return (await import('./check')).runSupport(args, io);
    case 'lab':
      return (await import('./lab')).runLab(args, io);
    case 'openings':
      return (await import('./openings')).runOpenings(args, io);
    default:
      throw new UsageError(`unknown command "${command}" (expected check, span, support, lab, openings or help)`);
  }
}

export async function run(argv: readonly string[], io: Io): Promise<ExitCode> {
  try {
    const args = parseArgs(argv);
    if (args.flags['--help'] || args.flags['-h'] || args.command === null || args.command === 'help') {
      io.out(USAGE);
      return args.command === null && !args.flags['--help'] && !args.flags['-h'] ? EXIT_REFUSED : EXIT_MEETS;
    }
    return await dispatch(args.command, args, io);
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`lamina: ${e.message}\nRun "lamina help" for usage.\n`);
      return EXIT_REFUSED;
    }
    if (e instanceof InputError) {
      io.err(`lamina: input refused: ${e.message}\n`);
      return EXIT_REFUSED;
    }
    if (e instanceof OutputError) {
      io.err(`lamina: ${e.message}\n`);
      return EXIT_REFUSED;
    }
    io.err(`lamina: internal error (a bug in Lamina, please report it): ${e instanceof Error ? e.message : String(e)}\n`);
    return EXIT_INTERNAL;
  }
}
