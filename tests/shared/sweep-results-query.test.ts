import { describe, expect, it } from 'vitest';
import { formatIssue } from '../../shared/schemas/format-issue.ts';
import { DesignsQuerySchema, PointsQuerySchema } from '../../shared/sweep/results-query.ts';

describe('PointsQuerySchema', () => {
  it('reads paging, a sort and range filters from filter[field] and the JSON filters parameter', () => {
    const q = PointsQuerySchema.parse({ offset: '20', limit: '50', sort: 'scanLossDb:desc', 'filter[nx]': '8..16', 'filter[peakSllDb]': '..-20', filters: '{"grouping":"element","phaseBits":{"min":4}}' });
    expect(q.offset).toBe(20);
    expect(q.limit).toBe(50);
    expect(q.sort).toEqual({ field: 'scanLossDb', dir: 'desc' });
    expect(q.filters).toEqual([
      { field: 'nx', min: 8, max: 16 },
      { field: 'peakSllDb', max: -20 },
      { field: 'grouping', eq: 'element' },
      { field: 'phaseBits', min: 4 },
    ]);
  });

  const issue = (q: Record<string, string>) => {
    const r = PointsQuerySchema.safeParse(q);
    return r.success ? null : formatIssue(r.error);
  };

  it('names bad fields and rules', () => {
    expect(issue({ limit: '1001' })).toBe('limit: must be an integer from 1 to 1000');
    expect(issue({ sort: 'colour:asc' })).toMatch(/^sort: "colour" is not a sortable field/);
    expect(issue({ sort: 'nx:up' })).toBe('sort: must be field:asc or field:desc');
    expect(issue({ 'filter[nx]': 'lots' })).toMatch(/^filter\.nx: must be a number or a range/);
    expect(issue({ 'filter[gratingLobeVisible]': 'maybe' })).toBe('filter.gratingLobeVisible: must be true or false');
    expect(issue({ filters: '{"nope":1}' })).toMatch(/^filters\.nope: "nope" is not a filterable field/);
    expect(issue({ filters: '[1' })).toBe('filters: must be a JSON object of field filters');
    expect(issue({ page: '2' })).toBe('page: is not a known query parameter');
  });

  it('the designs query knows the trade-table columns, not the per-point ones', () => {
    expect(DesignsQuerySchema.safeParse({ sort: 'scanLossEdgeDb:asc' }).success).toBe(true);
    expect(DesignsQuerySchema.safeParse({ sort: 'steerAzDeg:asc' }).success).toBe(false);
  });
});
