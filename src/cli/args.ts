/**
 * A small strict argument parser: known flags only, values where required. `-` alone is a
 * positional argument (standard input); after `--` every argument is positional.
 */
export class UsageError extends Error {}

export interface ParsedArgs {
  command: string | null;
  positional: string[];
  flags: Record<string, string | true>;
}

const VALUE_FLAGS = new Set(['--html', '--csv', '--units', '--rock', '--layer', '--samples', '--seed']);
const BOOLEAN_FLAGS = new Set(['--json', '--jsonl', '--markdown', '--no-trace', '--help', '-h']);

export function parseArgs(argv: readonly string[]): ParsedArgs {
  const positional: string[] = [];
  const flags: Record<string, string | true> = {};
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--') {
      positional.push(...argv.slice(i + 1));
      break;
    }
    if (arg.startsWith('-') && arg !== '-') {
      const [name, inline] = arg.includes('=') ? [arg.slice(0, arg.indexOf('=')), arg.slice(arg.indexOf('=') + 1)] : [arg, undefined];
      if (VALUE_FLAGS.has(name)) {
        const value = inline ?? argv[++i];
        if (value === undefined || value.startsWith('--')) throw new UsageError(`${name} needs a value`);
        flags[name] = value;
      } else if (BOOLEAN_FLAGS.has(name)) {
        flags[name] = true;
      } else {
        throw new UsageError(`unknown option ${name}`);
      }
    } else {
      positional.push(arg);
    }
  }
  const command = positional.shift() ?? null;
  return { command, positional, flags };
}
