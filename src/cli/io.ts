/**
 * What the command line touches outside itself, passed in so the tests can run it in-process:
 * stdout, stderr, files, stdin and whether stderr is a terminal (for the progress line).
 */
import { readFileSync, writeFileSync } from 'node:fs';

export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
  readFile: (path: string) => string;
  writeFile: (path: string, text: string) => void;
  /** The whole of standard input as text (`-` in place of a file name). */
  readStdin: () => string;
  /** True when stderr is a terminal: only then is a progress indicator drawn. */
  errIsTty: boolean;
}

/** The real process: its streams, the file system and fd 0 for stdin. */
export function processIo(): Io {
  return {
    out: (t) => void process.stdout.write(t),
    err: (t) => void process.stderr.write(t),
    readFile: (path) => readFileSync(path, 'utf8'),
    writeFile: (path, text) => writeFileSync(path, text, 'utf8'),
    readStdin: () => readFileSync(0, 'utf8'),
    errIsTty: process.stderr.isTTY === true,
  };
}
