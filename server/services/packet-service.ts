/**
 * The review packet's data: one object that the PDF (server/packet/render-pdf.ts) and the printable page
 * (src/views/PacketView.vue) both draw, so their tables and charts always agree.
 */
import type { AuthUser } from '../auth/types.ts';
import type { AppContext } from '../context.ts';
import { Candidate } from '../entities/candidate.ts';
import { TargetSheetRow } from '../entities/target-sheet.ts';
import { Team } from '../entities/team.ts';
import { scanDesign } from '../packet/design-scan.ts';
import { packetOrder, rankLatestSweep, type PacketSweepRanking } from '../packet/sweep-ranking.ts';
import { ENGINE_VERSION } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';
import { parseSweepDesignId, type StudyReview } from '../../shared/schemas/review.ts';
import { exposureEstimate, REFERENCE_LEVEL_SOURCE, RF_EXPOSURE_CAUTION, type ExposureEstimate } from '../../shared/safety/index.ts';
import { scanAngleDeg, type DesignFigures } from '../../shared/targets/figures.ts';
import { LIMIT_KEYS, LIMIT_LABELS, type LimitKey, type TargetSheet } from '../../shared/targets/sheet.ts';
import { rowVerdict, type Verdict } from '../../shared/trade/judge.ts';
import { RANK_OBJECTIVES } from '../../shared/trade/rank.ts';
import type { TradeDesign, TradeParams } from '../../shared/trade/trade-design.ts';
import { listDecisions, type DecisionView } from './decision-service.ts';
import { getStudyReview } from './review-request-service.ts';
import { resolveStoredDesigns } from './element-pattern-service.ts';
import { findStudyFor } from './study-access.ts';

/** Ranked rows printed; a packet is read, not searched. */
export const PACKET_MAX_RANKED = 20;

export type { PacketSweepDesign, PacketSweepRanking } from '../packet/sweep-ranking.ts';

export interface PacketLimit {
  key: LimitKey;
  label: string;
  value: string;
}

export interface PacketRankedDesign {
  rank: number;
  label: string;
  verdict: Verdict;
  figures: DesignFigures;
}

export interface PacketChartPoint {
  /** Angle from broadside, signed along the scan axis (degrees). */
  angleDeg: number;
  hpbwAzDeg: number | null;
  hpbwElDeg: number | null;
  scanLossDb: number | null;
  eirpDbm: number | null;
  /** Gain and EIRP toward the intended steer (null on decisions recorded before engine 1.1.0). */
  gainAtSteerDbi: number | null;
  eirpAtSteerDbm: number | null;
}

export interface PacketData {
  study: { id: string; name: string; description: string; teamName: string };
  generatedAt: string;
  engineVersion: string;
  job: string;
  /** The sheet the signed decision was judged against (judgedDecision), else the study's first sheet. */
  targetSheet: { name: string | null; preset: string | null; limits: PacketLimit[]; judgedDecision: boolean } | null;
  rankObjective: string;
  ranked: PacketRankedDesign[];
  /** The study's most recent finished sweep, ranked the same way; null when it has none. */
  sweepRanked: PacketSweepRanking | null;
  decision: DecisionView | null;
  history: DecisionView[];
  chart: { label: string; axis: 'az' | 'el'; points: PacketChartPoint[] } | null;
  /**
   * Far-field estimate from the signed decision's peak EIRP or, before any sign-off, from the highest peak EIRP
   * among the ranked designs (the worst case a reader should see); null when no design has an EIRP.
   */
  exposure: ExposureEstimate | null;
  /** Which EIRP the estimate uses, in words (printed beside it). */
  exposureBasis: string | null;
  /** Always printed, with or without an estimate. */
  caution: string;
  referenceSource: string;
  review: StudyReview;
}

const range = (r: { min?: number | null; max?: number | null }, unit: string) =>
  `${r.min ?? '…'} to ${r.max ?? '…'} ${unit}`.trim();

function limitText(key: LimitKey, sheet: TargetSheet): string | null {
  const v = sheet[key];
  if (v === null || v === undefined) return null;
  if (typeof v === 'boolean') return v ? 'required' : null;
  if (typeof v === 'number') return String(v);
  return range(v, key.startsWith('scan') || key.startsWith('hpbw') ? '°' : '');
}

function sheetLimits(sheet: TargetSheet): PacketLimit[] {
  return LIMIT_KEYS.flatMap((key) => {
    const value = limitText(key, sheet);
    return value === null ? [] : [{ key, label: LIMIT_LABELS[key], value }];
  });
}

function jobParagraph(description: string, sheetName: string | null, limits: PacketLimit[], candidates: number): string {
  if (description.trim()) return description.trim();
  const aim = sheetName ? `meet the target sheet "${sheetName}"` : 'meet the study’s requirements';
  const count = limits.length ? ` (${limits.length} limits)` : '';
  return `Choose one phased-array design that will ${aim}${count}, from the ${candidates} candidate${candidates === 1 ? '' : 's'} and the sweeps of this study, and record the choice with its rationale and the alternatives considered.`;
}

/** Candidates as trade rows (each evaluated across the scan), passing ones first, then by the default objective. */
function rankCandidates(candidates: Candidate[], sheetOfCandidate: (c: Candidate) => TargetSheet | null): { rows: PacketRankedDesign[] } {
  const rows = candidates.flatMap((c, i) => {
    // Each candidate is judged against the sheet it names.
    const sheet = sheetOfCandidate(c);
    // Stored designs are parsed on the way in; re-parse so an older row missing a default cannot break the packet.
    const parsed = DesignSchema.safeParse(c.design);
    if (!parsed.success) return [];
    let scan: ReturnType<typeof scanDesign>;
    try {
      scan = scanDesign(parsed.data, sheet);
    } catch {
      return [];
    }
    const row: TradeDesign = {
      designIndex: i,
      params: parsed.data as unknown as TradeParams,
      figures: scan.figures,
      gratingLobeOnsetAzDeg: scan.at.gratingLobeOnsetAzDeg,
      gratingLobeOnsetElDeg: scan.at.gratingLobeOnsetElDeg,
      scanRangeDeg: Math.max(...scan.points.map((p) => scanAngleDeg(p.steerAzDeg, p.steerElDeg))),
      directivityMaxDbi: Math.max(...scan.points.map((p) => p.metrics.directivityDbi)),
      points: scan.points.length,
      failedPoints: 0,
    };
    return [{ label: c.name, row, verdict: rowVerdict(row, sheet) }];
  });
  rows.sort(packetOrder);
  return {
    rows: rows.slice(0, PACKET_MAX_RANKED).map((r, i) => ({ rank: i + 1, label: r.label, verdict: r.verdict, figures: r.row.figures })),
  };
}

function chartOf(decision: DecisionView): PacketData['chart'] {
  const axis = decision.metrics.axis;
  const points = decision.metrics.points.map((p) => {
    const m = p.metrics as Record<string, number | null | undefined>;
    const signed = axis === 'el' ? Math.sign(p.steerElDeg) : Math.sign(p.steerAzDeg);
    return {
      angleDeg: (signed < 0 ? -1 : 1) * scanAngleDeg(p.steerAzDeg, p.steerElDeg),
      hpbwAzDeg: m.hpbwAzDeg ?? null,
      hpbwElDeg: m.hpbwElDeg ?? null,
      scanLossDb: m.scanLossDb ?? null,
      eirpDbm: m.eirpDbm ?? null,
      gainAtSteerDbi: m.gainAtSteerDbi ?? null,
      eirpAtSteerDbm: m.eirpAtSteerDbm ?? null,
    };
  });
  return { label: decision.label, axis, points: points.sort((a, b) => a.angleDeg - b.angleDeg) };
}

/** Peak EIRP of the chosen design over its frozen points (dBm), if it has a channel power. */
function peakEirp(decision: DecisionView): number | null {
  const figures = decision.metrics.figures as Partial<DesignFigures>;
  return typeof figures.peakEirpDbm === 'number' ? figures.peakEirpDbm : null;
}

export interface PacketOptions {
  /** Distance for the RF-exposure estimate (m). */
  distanceM?: number;
  /** Reference level for the estimate (W/m²). */
  referenceWm2?: number;
}

/** The EIRP the exposure estimate rests on: the signed design's, else the highest among the ranked designs. */
function exposureBasisOf(
  decision: DecisionView | null,
  designs: { label: string; figures: DesignFigures }[],
): { eirpDbm: number; words: string } | null {
  const signed = decision ? peakEirp(decision) : null;
  if (signed !== null) return { eirpDbm: signed, words: 'the signed design’s peak EIRP over its scan' };
  let top: { label: string; eirp: number } | null = null;
  for (const d of designs) {
    const e = d.figures.peakEirpDbm;
    if (typeof e === 'number' && (top === null || e > top.eirp)) top = { label: d.label, eirp: e };
  }
  return top && { eirpDbm: top.eirp, words: `the highest peak EIRP among the ranked designs (${top.label}), as no design is signed off yet` };
}

/** Everything the packet shows, for a user who may read the study. */
export async function buildPacket(ctx: AppContext, user: AuthUser, studyId: string, options: PacketOptions = {}): Promise<PacketData> {
  const study = await findStudyFor(ctx, user, studyId, 'read');
  const team = await ctx.db.getRepository(Team).findOneBy({ id: study.teamId });
  const sheetRows = await ctx.db.getRepository(TargetSheetRow).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC', id: 'ASC' } });
  const sheetRow = sheetRows[0] ?? null;
  const sheet = sheetRow?.sheet ?? null;
  const sheetById = (id: string | null) => (id ? sheetRows.find((r) => r.id === id)?.sheet : undefined) ?? sheet;
  const stored = await ctx.db.getRepository(Candidate).find({ where: { studyId }, order: { position: 'ASC', createdAt: 'ASC' } });
  // Uploaded element patterns are filled in (a candidate whose pattern is gone is left out of the ranking).
  const designs = await resolveStoredDesigns(ctx, studyId, stored.map((c) => c.design as { element?: unknown }));
  const candidates = stored.map((c, i) => Object.assign(Object.create(Object.getPrototypeOf(c) as object) as Candidate, c, { design: designs[i] }));
  const history = await listDecisions(ctx, user, studyId);
  const decision = history.find((d) => d.status === 'signed') ?? null;
  const limits = sheet ? sheetLimits(sheet) : [];
  const ranked = rankCandidates(candidates, (c) => sheetById(c.targetSheetId)).rows;
  // The decision's own sweep and sheet: the packet describes what was signed, not whatever is newest.
  const decisionSweep = decision?.source ? (parseSweepDesignId(decision.source)?.sweepId ?? null) : null;
  const judgedSheet = decision?.targetSheet ?? undefined;
  const sweepRanked = await rankLatestSweep(ctx.db.manager, studyId, sheetById, decisionSweep, judgedSheet);
  const basis = exposureBasisOf(decision, [...ranked, ...(sweepRanked?.rows ?? [])]);
  return {
    study: { id: study.id, name: study.name, description: study.description, teamName: team?.name ?? '' },
    generatedAt: new Date().toISOString(),
    engineVersion: ENGINE_VERSION,
    job: jobParagraph(study.description, sheet?.name ?? null, limits, candidates.length),
    targetSheet: judgedSheet
      ? { name: judgedSheet.name ?? null, preset: decision?.targetSheetId === sheetRow?.id ? (sheetRow?.preset ?? null) : null, limits: sheetLimits(judgedSheet), judgedDecision: true }
      : sheet
        ? { name: sheet.name ?? null, preset: sheetRow?.preset ?? null, limits, judgedDecision: false }
        : null,
    rankObjective: RANK_OBJECTIVES[0]!.label,
    ranked,
    sweepRanked,
    decision,
    history,
    chart: decision ? chartOf(decision) : null,
    exposure: basis ? exposureEstimate({ eirpDbm: basis.eirpDbm, distanceM: options.distanceM, referenceWm2: options.referenceWm2 }) : null,
    exposureBasis: basis?.words ?? null,
    caution: RF_EXPOSURE_CAUTION,
    referenceSource: REFERENCE_LEVEL_SOURCE,
    review: await getStudyReview(ctx, user, studyId),
  };
}

