/**
 * Patches of the current route's query, merged and written in one `router.replace` per tick, so two parts of a
 * page that keep their state in the URL (the trade view, a chart's axes) never overwrite each other's keys.
 */
import type { LocationQueryRaw, Router } from 'vue-router';

let pending: Record<string, string | undefined> | null = null;

/** Sets (string) or removes (undefined) query keys; the hash and the other keys stay. */
export function patchQuery(router: Router, patch: Record<string, string | undefined>): void {
  const first = pending === null;
  pending = { ...(pending ?? {}), ...patch };
  if (!first) return;
  queueMicrotask(() => {
    const p = pending ?? {};
    pending = null;
    const current = router.currentRoute.value;
    const query: LocationQueryRaw = { ...current.query };
    for (const [k, v] of Object.entries(p)) {
      if (v === undefined) delete query[k];
      else query[k] = v;
    }
    const same = JSON.stringify(query) === JSON.stringify(current.query);
    if (!same) void router.replace({ path: current.path, query, hash: current.hash });
  });
}
