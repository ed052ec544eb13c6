/**
 * Exit codes of the command line (DESIGN.md "Command line", README "Exit codes"):
 * 0 every check meets its target; 1 at least one is below; 2 the input was refused or an
 * output could not be written (the message names the field, option or path); 3 an internal
 * error — a bug in Lamina, never the user's input. Over several files or openings the code
 * is the worst one: 3 > 2 > 1 > 0.
 */
export const EXIT_MEETS = 0;
export const EXIT_BELOW = 1;
export const EXIT_REFUSED = 2;
export const EXIT_INTERNAL = 3;

export type ExitCode = typeof EXIT_MEETS | typeof EXIT_BELOW | typeof EXIT_REFUSED | typeof EXIT_INTERNAL;

/** The worst of two exit codes (the larger). */
export const worstExit = (a: ExitCode, b: ExitCode): ExitCode => (a >= b ? a : b);
