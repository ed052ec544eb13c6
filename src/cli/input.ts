/** Reading and refusing input files for the CLI: every problem with its field path. */
import { readProjectText } from '../model/project-file';
import { ProjectError, type FieldIssue } from '../model/validate';
import type { Project } from '../model/types';
import type { UnitSystem } from '../model/units';
import { UsageError, type ParsedArgs } from './args';

/** A refused input (exit 2). `issues` lists each problem with its field path, when known. */
export class InputError extends Error {
  constructor(
    message: string,
    readonly issues: ReadonlyArray<{ path: string; message: string }> = [{ path: '', message }],
  ) {
    super(message);
  }
}

export function readFileOrRefuse(path: string, readFile: (p: string) => string): string {
  try {
    return readFile(path);
  } catch (e) {
    throw new InputError(`${path}: cannot read the file (${e instanceof Error ? e.message.split('\n')[0] : String(e)})`);
  }
}

/** Parse and validate project text read from `name`; a refusal names every field. */
export function parseProjectText(name: string, text: string): { project: Project; text: string; warnings: FieldIssue[] } {
  try {
    const { project, warnings } = readProjectText(text);
    return { project, text, warnings };
  } catch (e) {
    if (e instanceof ProjectError) {
      const issues = e.issues.map((i) => ({ path: i.path, message: stripPath(i.message, i.path) }));
      throw new InputError(`${name}:\n` + issues.map((i) => `  ${i.path ? `${i.path}: ` : ''}${i.message}`).join('\n'), issues);
    }
    throw e;
  }
}

export function loadProject(path: string, readFile: (p: string) => string): { project: Project; text: string; warnings: FieldIssue[] } {
  return parseProjectText(path, readFileOrRefuse(path, readFile));
}

/** Messages may already start with their path; print it once. */
function stripPath(message: string, path: string): string {
  return path && message.startsWith(`${path}:`) ? message.slice(path.length + 1).trimStart() : message;
}

export function unitsFlag(args: ParsedArgs): UnitSystem {
  const u = args.flags['--units'];
  if (u === undefined) return 'SI';
  if (u === 'SI' || u === 'US') return u;
  throw new UsageError(`--units must be SI or US, got "${String(u)}"`);
}

export function onePath(args: ParsedArgs, what: string): string {
  if (args.positional.length !== 1) throw new UsageError(`${args.command} needs exactly one ${what}, got ${args.positional.length}`);
  return args.positional[0];
}

/** Print a file's validation warnings on stderr, each with its field path. */
export function printWarnings(err: (text: string) => void, name: string, warnings: ReadonlyArray<{ path: string; message: string }>): void {
  for (const w of warnings) err(`lamina: warning: ${name}: ${w.message.startsWith(w.path) ? w.message : `${w.path}: ${w.message}`}\n`);
}
