/** Thrown by CLI commands for bad input: the dispatcher prints the message as one line and exits 2. */
export class UsageError extends Error {
  override name = 'UsageError';
}
