/**
 * The file arguments of a command: each name, each match of a pattern (src/cli/glob.ts) and
 * `-` for standard input, in the order given. A pattern that matches nothing becomes an input
 * that is refused with that reason, so the other files are still checked.
 */
import { existsSync } from 'node:fs';
import { UsageError } from './args';
import { expandGlob, hasGlob } from './glob';
import { InputError } from './input';
import type { Io } from './io';

export interface InputSource {
  /** The name printed in messages and in JSON output: the path, or `-` for standard input. */
  name: string;
  /** Set when the argument was a pattern that matched no file. */
  unmatched?: true;
}

export const STDIN = '-';

export function expandInputs(args: readonly string[]): InputSource[] {
  if (args.filter((a) => a === STDIN).length > 1) throw new UsageError('standard input (-) can be read only once');
  return args.flatMap((arg): InputSource[] => {
    if (arg === STDIN || !hasGlob(arg) || existsSync(arg)) return [{ name: arg }];
    const matches = expandGlob(arg);
    return matches.length ? matches.map((name) => ({ name })) : [{ name: arg, unmatched: true }];
  });
}

/** The text of one input (a file, or standard input for `-`); refused with the reason. */
export function readSource(source: InputSource, io: Io): string {
  if (source.unmatched) throw new InputError(`${source.name}: no file matches this pattern`);
  try {
    return source.name === STDIN ? io.readStdin() : io.readFile(source.name);
  } catch (e) {
    const what = source.name === STDIN ? 'standard input' : 'the file';
    throw new InputError(`${source.name}: cannot read ${what} (${e instanceof Error ? e.message.split('\n')[0] : String(e)})`);
  }
}
