/** Server refusals as form feedback: the message for an alert, and per-field help keyed by field name. */
import { ApiRequestError } from '@/api/client';

export interface FormFailure {
  message: string;
  fields: Record<string, string>;
}

export function formFailure(err: unknown): FormFailure {
  if (err instanceof ApiRequestError) {
    const fields: Record<string, string> = {};
    for (const f of err.fields) fields[f.field] ??= f.message;
    return { message: err.message, fields };
  }
  return { message: err instanceof Error ? err.message : String(err), fields: {} };
}

/** validate-status and help of an a-form-item, from the server's message for `field` (bind with v-bind). */
export function fieldFeedback(failure: FormFailure | null, field: string): { validateStatus: 'error' | undefined; help: string | undefined } {
  const help = failure?.fields[field];
  return { validateStatus: help ? 'error' : undefined, help };
}
