/**
 * The one way the client turns a failure into words: `errorMessage(err)` for an alert or toast, and
 * `formFailure(err)` for a form (the message plus the server's per-field issues, keyed by field name).
 * Server messages are shown as they come ("field: rule").
 */
import { ApiRequestError } from './client';

export { ApiRequestError, type FieldIssue } from './client';

export function errorMessage(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

/** The HTTP status of a refused request (0 when the server was not reached or the failure was not a request). */
export function errorStatus(err: unknown): number {
  return err instanceof ApiRequestError ? err.status : 0;
}

export interface FormFailure {
  message: string;
  fields: Record<string, string>;
}

export function formFailure(err: unknown): FormFailure {
  const fields: Record<string, string> = {};
  if (err instanceof ApiRequestError) for (const f of err.fields) fields[f.field] ??= f.message;
  return { message: errorMessage(err), fields };
}

/** validate-status and help of an a-form-item, from the server's message for `field` (bind with v-bind). */
export function fieldFeedback(failure: FormFailure | null, field: string): { validateStatus: 'error' | undefined; help: string | undefined } {
  const help = failure?.fields[field];
  return { validateStatus: help ? 'error' : undefined, help };
}
