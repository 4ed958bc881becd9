/** Turns a zod error into the "field.path: rule" lines that the CLI, the API and the forms show. */
import type { z } from 'zod';

type Issue = z.core.$ZodIssue;

function fieldOf(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}

/** Union failures nest the real cause; pick the branch that got furthest (deepest path, fewest type errors). */
function unwrap(issue: Issue, base: readonly PropertyKey[]): { path: PropertyKey[]; issue: Issue } {
  const path = [...base, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    let best: { path: PropertyKey[]; issue: Issue } | null = null;
    let bestScore = -Infinity;
    for (const branch of issue.errors) {
      const first = branch[0];
      if (!first) continue;
      const cand = unwrap(first, path);
      const rootTypeMismatch = first.code === 'invalid_type' && first.path.length === 0;
      const score = cand.path.length - (rootTypeMismatch ? 100 : 0);
      if (score > bestScore) {
        best = cand;
        bestScore = score;
      }
    }
    if (best) return best;
  }
  if (issue.code === 'unrecognized_keys') {
    return { path: [...path, issue.keys[0] ?? ''], issue: { ...issue, message: 'is not a known field' } };
  }
  return { path, issue };
}

/** Every issue as {field, message}; field is '' for the whole value. */
export function issueFields(error: z.ZodError): { field: string; message: string }[] {
  return error.issues.map((raw) => {
    const { path, issue } = unwrap(raw, []);
    return { field: fieldOf(path), message: issue.message };
  });
}

/** The first issue as one line, "field.path: rule" (e.g. "nx: must be an integer from 1 to 64"). */
export function formatIssue(error: z.ZodError): string {
  const first = issueFields(error)[0];
  if (!first) return 'invalid input';
  return first.field === '' ? first.message : `${first.field}: ${first.message}`;
}
