/** A text file that cannot be read as the expected table: the 1-based line and the reason. */
export class DelimitedParseError extends Error {
  override name = 'DelimitedParseError';
  constructor(
    readonly line: number,
    readonly reason: string,
  ) {
    super(`line ${line}: ${reason}`);
  }
}
