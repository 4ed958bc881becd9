/**
 * Search over every design a reviewer can sign off in a study: its candidates (by name or parameters) and every
 * design of every finished sweep (by design number or parameters; a candidate's name also finds the sweep designs
 * with its parameters). Each typed term narrows the result (AND); every value is a bound parameter.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { sweepDesignLabel } from '../packet/sweep-design.ts';
import type { DesignSearchHit, DesignSearchQuery, DesignSearchResult } from '../../shared/schemas/review.ts';
import { designLabel } from '../../shared/trade/design-label.ts';
import { parseDesignQuery, type DesignTerm } from '../../shared/trade/design-query.ts';
import { findStudyFor } from './study-access.ts';

/** Pitch typed as "5.35 mm" matches a stored 5.35 within rounding of the printed figure. */
const PITCH_TOL_MM = 0.005;
const FREQ_TOL_GHZ = 0.0005;

type Design = Record<string, unknown>;

const num = (d: Design, k: string) => (typeof d[k] === 'number' ? (d[k] as number) : null);

/** Does a candidate's design (or name) satisfy one term? */
function candidateMatches(name: string, d: Design, t: DesignTerm): boolean {
  const text = `${name} ${designLabel(d)}`.toLowerCase();
  switch (t.kind) {
    case 'designIndex': return false;
    case 'size': return num(d, 'nx') === t.nx && (num(d, 'ny') ?? 1) === t.ny;
    case 'channels': return false;
    case 'phaseBits': return (num(d, 'phaseBits') ?? null) === t.value;
    case 'pitchMm': return Math.abs((num(d, 'dxMm') ?? NaN) - t.value) <= PITCH_TOL_MM || Math.abs((num(d, 'dyMm') ?? num(d, 'dxMm') ?? NaN) - t.value) <= PITCH_TOL_MM;
    case 'frequencyGHz': return Math.abs((num(d, 'frequencyGHz') ?? NaN) - t.value) <= FREQ_TOL_GHZ;
    case 'grouping': return (d.grouping ?? 'element') === t.value || text.includes(t.value);
    case 'word': return text.includes(t.value);
  }
}

/** One SQL condition per term over sweep_designs `d` joined to sweeps `s`. */
function termSql(t: DesignTerm, bind: (v: unknown) => string): string {
  switch (t.kind) {
    case 'designIndex': return `d.design_index = ${bind(t.value)}`;
    case 'size': return `(d.nx = ${bind(t.nx)} AND coalesce(d.ny, 1) = ${bind(t.ny)})`;
    case 'channels': return `d.channels = ${bind(t.value)}`;
    case 'phaseBits': return t.value === null ? `d.phase_bits IS NULL` : `d.phase_bits = ${bind(t.value)}`;
    case 'pitchMm': {
      const v = bind(t.value);
      return `(abs(d.dx_mm - ${v}) <= ${PITCH_TOL_MM} OR abs(coalesce(d.dy_mm, d.dx_mm) - ${v}) <= ${PITCH_TOL_MM})`;
    }
    case 'frequencyGHz': return `abs(d.frequency_ghz - ${bind(t.value)}) <= ${FREQ_TOL_GHZ}`;
    case 'grouping': return `coalesce(d.grouping, 'element') = ${bind(t.value)}`;
    case 'word': {
      const like = bind(`%${t.value.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
      return `(d.taper_x ILIKE ${like} OR d.taper_y ILIKE ${like} OR d.element ILIKE ${like} OR d.grouping ILIKE ${like} OR s.name ILIKE ${like})`;
    }
  }
}

/** Sweep designs with the parameters of a named candidate (size, pitch, bits, grouping, frequency). */
function sameParamsSql(d: Design, bind: (v: unknown) => string): string {
  return `(d.nx = ${bind(num(d, 'nx'))} AND coalesce(d.ny, 1) = ${bind(num(d, 'ny') ?? 1)}
    AND abs(d.dx_mm - ${bind(num(d, 'dxMm'))}) <= ${PITCH_TOL_MM}
    AND abs(coalesce(d.dy_mm, d.dx_mm) - ${bind(num(d, 'dyMm') ?? num(d, 'dxMm'))}) <= ${PITCH_TOL_MM}
    AND d.phase_bits IS NOT DISTINCT FROM ${bind(num(d, 'phaseBits'))}::int
    AND coalesce(d.grouping, 'element') = ${bind((d.grouping as string | undefined) ?? 'element')}
    AND abs(d.frequency_ghz - ${bind(num(d, 'frequencyGHz'))}) <= ${FREQ_TOL_GHZ})`;
}

export async function searchDesigns(ctx: AppContext, user: AuthUser, studyId: string, query: DesignSearchQuery): Promise<DesignSearchResult> {
  await findStudyFor(ctx, user, studyId, 'read');
  const terms = parseDesignQuery(query.q);
  const words = query.q.trim().toLowerCase();
  const candidates = await ctx.db.getRepository(Candidate).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC' } });
  const byName = words === '' ? [] : candidates.filter((c) => c.name.toLowerCase().includes(words));
  const candidateHits = candidates.filter((c) => byName.includes(c) || terms.every((t) => candidateMatches(c.name, c.design as Design, t)));

  const params: unknown[] = [studyId];
  const bind = (v: unknown) => {
    params.push(v);
    return `$${params.length}`;
  };
  const own = terms.map((t) => termSql(t, bind));
  const alternatives = [own.length ? own.join(' AND ') : 'true', ...byName.map((c) => sameParamsSql(c.design as Design, bind))];
  // A device sweep's rows are variants of a whole device, judged by coverage: not module designs to sign off.
  const where = `s.study_id = $1 AND s.status = 'done' AND s.device IS NULL AND (${alternatives.map((a) => `(${a})`).join(' OR ')})`;
  const from = `FROM sweep_designs d JOIN sweeps s ON s.id = d.sweep_id WHERE ${where}`;
  const [{ total }] = (await ctx.db.query(`SELECT count(*)::int AS total ${from}`, params)) as [{ total: number }];
  const rows = (await ctx.db.query(
    `SELECT d.sweep_id, s.name AS sweep_name, d.design_index, d.design ${from}
      ORDER BY s.finished_at DESC NULLS LAST, s.created_at DESC, d.design_index LIMIT ${query.limit}`,
    params,
  )) as { sweep_id: string; sweep_name: string; design_index: number; design: Design }[];

  const hits: DesignSearchHit[] = [
    ...candidateHits.map((c): DesignSearchHit => {
      const description = designLabel(c.design as Design);
      return {
        key: `candidate:${c.id}`, kind: 'candidate', design: c.design as Design, label: `Candidate “${c.name}”: ${description}`,
        designIndex: null, sweep: null, candidate: { id: c.id, name: c.name }, description, targetSheetId: c.targetSheetId ?? null,
      };
    }),
    ...rows.map((r): DesignSearchHit => ({
      key: `sweep:${r.sweep_id}:${r.design_index}`, kind: 'sweep', design: `${r.sweep_id}:${r.design_index}`,
      label: sweepDesignLabel(r.sweep_name, r.design_index, r.design), designIndex: r.design_index,
      sweep: { id: r.sweep_id, name: r.sweep_name }, candidate: null, description: designLabel(r.design), targetSheetId: null,
    })),
  ];
  return { hits, total };
}
