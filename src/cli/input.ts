/** Reading and refusing input files for the CLI: every problem with its field path. */
import { readProjectText } from '../model/project-file';
import { ProjectError, type FieldIssue } from '../model/validate';
import type { Project } from '../model/types';
import type { UnitSystem } from '../model/units';
import { UsageError, type ParsedArgs } from './args';

export class InputError extends Error {}

export function readFileOrRefuse(path: string, readFile: (p: string) => string): string {
  try {
    return readFile(path);
  } catch (e) {
    throw new InputError(`${path}: cannot read the file (${e instanceof Error ? e.message.split('\n')[0] : String(e)})`);
  }
}

export function loadProject(path: string, readFile: (p: string) => string): { project: Project; text: string; warnings: FieldIssue[] } {
  const text = readFileOrRefuse(path, readFile);
  try {
    const { project, warnings } = readProjectText(text);
    return { project, text, warnings };
  } catch (e) {
    if (e instanceof ProjectError) {
      throw new InputError(`${path}:\n` + e.issues.map((i) => `  ${i.path ? `${i.path}: ` : ''}${stripPath(i.message, i.path)}`).join('\n'));
    }
    throw e;
  }
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
