import { describe, expect, it } from 'vitest';
import type { ValueFormatterParams, ValueGetterParams } from 'ag-grid-community';
import { lastChangeText, sharedWithText, studiesColumns } from '@/components/study/studies-columns';
import type { StudyRow } from '@/stores/studies';

const row: StudyRow = {
  id: 's1', name: 'Handset module', description: '', visibility: 'team', ownerId: 'u1', ownerName: 'Ada Engineer',
  targetSheetPreset: 'handset-28ghz', targetSheetName: null, candidateCount: 3, sweepCount: 1, archivedAt: null,
  createdAt: '2025-01-01T10:00:00Z', updatedAt: '2025-01-02T10:00:00Z',
  sharedWith: [{ userId: 'u2', name: 'Bo Reviewer', access: 'viewer' }],
};

describe('studiesColumns()', () => {
  const cols = studiesColumns(() => new Date('2025-03-01T00:00:00Z'));

  it('has the columns of the studies list, in order', () => {
    expect(cols.map((c) => c.headerName)).toEqual(['Name', 'Owner', 'Target sheet', 'Candidates', 'Sweeps', 'Review', 'Last change', 'Shared with']);
  });

  it('shows the review state and counts review activity as the last change', () => {
    const byId = Object.fromEntries(cols.map((c) => [c.colId, c]));
    const get = (id: string, data: StudyRow) => (byId[id]!.valueGetter as (p: ValueGetterParams<StudyRow>) => unknown)({ data } as ValueGetterParams<StudyRow>);
    expect(get('review', { ...row, reviewState: 'sent_back' })).toBe('Sent back');
    expect(get('review', row)).toBe('Draft');
    expect(get('lastChange', { ...row, lastChangeAt: '2025-02-20T09:00:00Z' })).toBe('2025-02-20T09:00:00Z');
    expect(get('lastChange', row)).toBe(row.updatedAt);
  });

  it('reads each column from the list row', () => {
    const byId = Object.fromEntries(cols.map((c) => [c.colId, c]));
    expect(byId.owner!.field).toBe('ownerName');
    expect(byId.candidates!.field).toBe('candidateCount');
    expect(byId.sweeps!.field).toBe('sweepCount');
    const get = (id: string) => (byId[id]!.valueGetter as (p: ValueGetterParams<StudyRow>) => unknown)({ data: row } as ValueGetterParams<StudyRow>);
    expect(get('targetSheet')).toBe('handset-28ghz');
    expect(get('targetSheet')).not.toBe('—');
    expect(get('sharedWith')).toBe('Whole team, Bo Reviewer (viewer)');
  });

  it('sorts by last change, newest first, and marks archived names', () => {
    const byId = Object.fromEntries(cols.map((c) => [c.colId, c]));
    expect(byId.lastChange!.sort).toBe('desc');
    const fmt = byId.name!.valueFormatter as (p: ValueFormatterParams<StudyRow>) => string;
    expect(fmt({ value: 'Old', data: { ...row, archivedAt: '2025-01-05T00:00:00Z' } } as ValueFormatterParams<StudyRow>)).toBe('Old (archived)');
    expect(fmt({ value: 'New', data: row } as ValueFormatterParams<StudyRow>)).toBe('New');
  });
});

describe('sharedWithText and lastChangeText', () => {
  it('says who else sees a private study', () => {
    expect(sharedWithText({ visibility: 'private', sharedWith: [] })).toBe('Only the owner');
    expect(sharedWithText({ visibility: 'private', sharedWith: [{ userId: 'x', name: 'Cy', access: 'editor' }] })).toBe('Cy (editor)');
  });

  it('writes recent changes relative to now', () => {
    const now = new Date('2025-03-01T12:00:00Z');
    expect(lastChangeText('2025-03-01T11:59:40Z', now)).toBe('just now');
    expect(lastChangeText('2025-03-01T11:15:00Z', now)).toBe('45 min ago');
    expect(lastChangeText(null, now)).toBe('');
    expect(lastChangeText('2024-12-25T12:00:00Z', now)).toMatch(/2024/);
  });
});
