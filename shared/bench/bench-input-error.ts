/** A bench input that cannot be used: names the field and the rule, like the zod layer does ("field: rule"). */
export class BenchInputError extends Error {
  override name = 'BenchInputError';
  constructor(
    readonly field: string,
    readonly rule: string,
  ) {
    super(`${field}: ${rule}`);
  }
}
