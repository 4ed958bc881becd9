/**
 * What to tell a reader of a sweep computed by an earlier engine whose figures meant something else: since 1.1.0
 * scan loss and EIRP are gain figures (README, "Changed in this version"), so a sweep from 1.0.x keeps the older
 * definitions and lacks the gain columns. Patch releases change no definition, so only major.minor counts.
 */
import { ENGINE_VERSION } from '../engine/constants.ts';

const majorMinor = (v: string): [number, number] | null => {
  const m = /^(\d+)\.(\d+)/.exec(v);
  return m ? [Number(m[1]), Number(m[2])] : null;
};

export function olderEngineNote(sweepEngineVersion: string | null | undefined, current: string = ENGINE_VERSION): string | null {
  if (!sweepEngineVersion) return null;
  const was = majorMinor(sweepEngineVersion);
  const now = majorMinor(current);
  if (!was || !now || was[0] > now[0] || (was[0] === now[0] && was[1] >= now[1])) return null;
  return (
    `Computed with engine ${sweepEngineVersion}; this is engine ${current}. Its scan loss and EIRP follow the earlier ` +
    'definitions (directivity-based, every channel at full power) and its gain columns are empty: run the sweep again to compare it with newer ones.'
  );
}
