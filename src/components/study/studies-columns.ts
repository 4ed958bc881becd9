/** Column definitions of the studies list. Pure, so the component test checks headers and formatting directly. */
import type { ColDef, ValueFormatterParams, ValueGetterParams } from 'ag-grid-community';
import type { StudyRow } from '@/stores/studies';
import { STUDY_STATE_LABELS } from '@/components/review/review-labels';

/** "Whole team", the people it is shared with, or "Only the owner". */
export function sharedWithText(row: Pick<StudyRow, 'visibility' | 'sharedWith'>): string {
  const people = row.sharedWith.map((s) => `${s.name} (${s.access})`);
  if (row.visibility === 'team') return ['Whole team', ...people].join(', ');
  return people.length ? people.join(', ') : 'Only the owner';
}

/** A short local date-time, or a relative phrase for today. */
export function lastChangeText(iso: string | null | undefined, now: Date = new Date()): string {
  if (!iso) return '';
  const t = new Date(iso);
  if (Number.isNaN(t.getTime())) return '';
  const minutes = Math.round((now.getTime() - t.getTime()) / 60_000);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  if (t.toDateString() === now.toDateString()) return `today ${t.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}`;
  return t.toLocaleDateString([], { year: 'numeric', month: 'short', day: 'numeric' });
}

export function studiesColumns(now: () => Date = () => new Date()): ColDef<StudyRow>[] {
  return [
    {
      colId: 'name',
      headerName: 'Name',
      field: 'name',
      flex: 2,
      minWidth: 180,
      sort: undefined,
      cellClass: 'study-name',
      valueFormatter: (p: ValueFormatterParams<StudyRow>) => (p.data?.archivedAt ? `${p.value} (archived)` : String(p.value ?? '')),
    },
    { colId: 'owner', headerName: 'Owner', field: 'ownerName', flex: 1, minWidth: 120 },
    {
      colId: 'targetSheet',
      headerName: 'Target sheet',
      valueGetter: (p: ValueGetterParams<StudyRow>) => p.data?.targetSheetName ?? p.data?.targetSheetPreset ?? '—',
      flex: 1,
      minWidth: 140,
    },
    { colId: 'candidates', headerName: 'Candidates', field: 'candidateCount', type: 'rightAligned', width: 120 },
    { colId: 'sweeps', headerName: 'Sweeps', field: 'sweepCount', type: 'rightAligned', width: 100 },
    {
      colId: 'review',
      headerName: 'Review',
      valueGetter: (p: ValueGetterParams<StudyRow>) => STUDY_STATE_LABELS[p.data?.reviewState ?? 'draft'].text,
      cellClass: (p) => `review-${p.data?.reviewState ?? 'draft'}`,
      width: 130,
    },
    {
      colId: 'lastChange',
      headerName: 'Last change',
      // Review activity (asked, answered, commented, signed) counts as a change of the study.
      valueGetter: (p: ValueGetterParams<StudyRow>) => p.data?.lastChangeAt ?? p.data?.updatedAt,
      width: 150,
      sort: 'desc',
      valueFormatter: (p: ValueFormatterParams<StudyRow>) => lastChangeText(p.value as string, now()),
      comparator: (a: string, b: string) => new Date(a).getTime() - new Date(b).getTime(),
    },
    {
      colId: 'sharedWith',
      headerName: 'Shared with',
      valueGetter: (p: ValueGetterParams<StudyRow>) => (p.data ? sharedWithText(p.data) : ''),
      flex: 1.5,
      minWidth: 160,
      tooltip: (p) => (p.data ? sharedWithText(p.data) : ''),
    },
  ];
}
