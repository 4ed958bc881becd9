/** Words for a sweep's progress: percent done, rate and time left, as the bar and the list print them. */
import type { SweepProgress } from '@/stores/sweeps';

export function percentDone(p: Pick<SweepProgress, 'pointsDone' | 'pointsTotal'>): number {
  if (p.pointsTotal <= 0) return 0;
  return Math.min(100, Math.round((1000 * p.pointsDone) / p.pointsTotal) / 10);
}

/** "2 min 05 s", "45 s", "1 h 03 min"; an unknown time is "estimating…". */
export function formatDuration(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds) || seconds < 0) return 'estimating…';
  const s = Math.round(seconds);
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, '0')} s`;
  return `${Math.floor(s / 3600)} h ${String(Math.floor((s % 3600) / 60)).padStart(2, '0')} min`;
}

export function formatRate(rate: number | null | undefined): string {
  if (rate === null || rate === undefined || !Number.isFinite(rate)) return '—';
  return `${rate >= 100 ? Math.round(rate).toLocaleString('en-US') : rate.toFixed(1)} points/s`;
}

export const STATUS_WORDS: Record<string, { text: string; color: string }> = {
  queued: { text: 'queued', color: 'default' },
  running: { text: 'running', color: 'processing' },
  done: { text: 'done', color: 'success' },
  failed: { text: 'failed', color: 'error' },
  cancelled: { text: 'cancelled', color: 'warning' },
};
