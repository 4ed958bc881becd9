/**
 * Spreadsheet-formula neutralisation for every export (CSV, Excel, bench codes, sweep results).
 * A text cell that starts with `=`, `+`, `-`, `@`, a tab or a carriage return is read as a formula when the file
 * is opened (OWASP "CSV Injection"); such text gets a leading apostrophe, which spreadsheets show as plain text.
 * Numbers are left alone: `-30.5` written from a number (or text that is exactly a number) is a value, not a formula.
 */

const TRIGGER = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** The text with a leading apostrophe when a spreadsheet would evaluate it; other text unchanged. */
export function safeText(text: string): string {
  return TRIGGER.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/** One cell value for an export: strings neutralised, numbers, booleans, null and dates passed through. */
export function safeCell<T>(value: T): T | string {
  return typeof value === 'string' ? safeText(value) : value;
}
