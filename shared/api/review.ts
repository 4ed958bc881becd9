/** Response shapes of the review routes (comments, decisions, team members to ask) — server/routes/review*.ts. */
import type { SheetCheck } from '../targets/check.ts';

export type ViewState = Record<string, unknown>;

export interface Member {
  id: string;
  name: string;
  email: string;
  role: 'admin' | 'engineer' | 'reviewer';
}

export interface CommentRow {
  id: string;
  author: { id: string; name: string };
  body: string;
  target: { kind: 'study' | 'design' | 'chart'; ref: string | null };
  viewState: ViewState | null;
  mentions: { id: string; name: string }[];
  createdAt: string;
  link: string;
}

export interface FrozenPoint {
  steerAzDeg: number;
  steerElDeg: number;
  metrics: Record<string, unknown>;
}

export interface DecisionRow {
  id: string;
  label: string;
  design: Record<string, unknown>;
  metrics: { at: Record<string, unknown> | null; axis: 'az' | 'el'; points: FrozenPoint[]; figures: Record<string, number | boolean | null>; basis?: string };
  engineVersion: string;
  source: string | null;
  rationale: string;
  alternatives: { label: string; reason: string }[];
  signedAt: string | null;
  supersedesId: string | null;
  supersededById: string | null;
  status: 'draft' | 'signed' | 'superseded';
  decidedBy: { id: string; name: string };
  createdAt: string;
  targetSheetId: string | null;
  targetSheet: (Record<string, unknown> & { name?: string }) | null;
  check: SheetCheck | null;
  failedLimits: string[];
  justification: string;
}

/** What signing a design would record (POST …/decisions/check), for the confirmation dialog. */
export type DecisionPreviewRow = Pick<DecisionRow, 'label' | 'design' | 'metrics' | 'targetSheetId' | 'targetSheet' | 'check' | 'failedLimits'> & {
  metrics: DecisionRow['metrics'] & { basis?: string };
};
