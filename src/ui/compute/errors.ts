/** Error text for the user: the message only, never a stack trace. */
export function errorText(err: unknown): string {
  if (err instanceof Error) return err.message || err.name;
  return String(err);
}
