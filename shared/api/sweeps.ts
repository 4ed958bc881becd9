/**
 * Response shapes of the sweep routes (server/routes/sweeps.ts). Timestamps are Date on the server and ISO text on
 * the wire, hence the type parameter.
 */
import type { SweepCostBasis } from '../cost/cost-model.ts';
import type { PointResult } from '../sweep/chunk.ts';
import type { SteerSpan } from '../trade/trade-design.ts';
import type { Element, Taper } from '../schemas/design.ts';
import type { DeviceSweepAbout } from '../devices/device-sweep-spec.ts';

export type SweepStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

/** A sweep's state: GET /api/sweeps/:id, each row of GET /api/studies/:id/sweeps, each message of …/events. */
export interface SweepProgress<Time = string> {
  id: string;
  studyId: string;
  name: string;
  status: SweepStatus;
  pointsTotal: number;
  pointsDone: number;
  pointsFailed: number;
  designsTotal: number;
  anglesPerDesign: number;
  /** Points per second since the sweep started (null before it starts). */
  ratePerSecond: number | null;
  /** Estimated seconds left at that rate (0 when finished, null when unknown). */
  etaSeconds: number | null;
  engineVersion: string;
  error: string | null;
  /** The sheet that judges its designs; null: the study's first. */
  targetSheetId: string | null;
  /** A sweep over a device (its variants' coverage are the design rows); null for a sweep over a grid of designs. */
  device: DeviceSweepAbout | null;
  createdAt: Time;
  startedAt: Time | null;
  finishedAt: Time | null;
}

/** POST /api/studies/:id/sweeps and POST /api/devices/:id/sweeps. */
export interface SweepCreated {
  id: string;
  pointsTotal: number;
}

/** One page of a paged list: GET /api/sweeps/:id/results and …/designs. */
export interface Page<T> {
  total: number;
  rows: T[];
}

/** A design row of GET /api/sweeps/:id/designs: its figures by field name plus the design itself. */
export type DesignRow = Record<string, unknown> & { designIndex: number; design: Record<string, unknown> };

/** GET /api/sweeps/:id/designs: design rows and which cost model priced them. */
export type DesignsPage = Page<DesignRow> & { cost: SweepCostBasis };

/** GET /api/sweeps/:id/results. */
export type PointsPage = Page<PointResult>;

/** GET /api/sweeps/:id/steer-span: the steering the sweep's points cover (null while it has no points). */
export type SteerSpanAnswer = { span: SteerSpan | null };

/** A candidate's design as the sweep builder reads it (a resolved engine design; extra fields are ignored). */
export interface CandidateDesign {
  frequencyGHz: number;
  nx: number;
  ny?: number;
  dxMm: number;
  dyMm?: number;
  taperX?: Taper;
  taperY?: Taper;
  phaseBits?: number | null;
  grouping?: 'element' | 'column' | 'row';
  element?: Element;
  channelPowerDbm?: number | null;
  steerAzDeg?: number;
  steerElDeg?: number;
}
