/**
 * Writing the files an option names (`--csv OUT.csv`, `--html OUT.html`). A path that cannot
 * be written — a missing directory, a directory, no permission — is refused with exit 2 and a
 * message naming the option and the path, never an internal error.
 */
import type { Io } from './io';

/** An output that could not be written (exit 2). */
export class OutputError extends Error {}

const REASONS: Record<string, string> = {
  ENOENT: 'its directory does not exist',
  ENOTDIR: 'a part of the path is not a directory',
  EISDIR: 'it is a directory',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'the file system is read-only',
  ENOSPC: 'no space left on the device',
};

export function writeOutput(io: Io, option: string, path: string, text: string): void {
  try {
    io.writeFile(path, text);
  } catch (e) {
    const code = (e as { code?: unknown } | null)?.code;
    const reason = typeof code === 'string' && REASONS[code] ? REASONS[code] : e instanceof Error ? e.message.split('\n')[0] : String(e);
    throw new OutputError(`${option} ${path}: cannot write the file (${reason})`);
  }
}
