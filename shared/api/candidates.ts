/** Response shape of the candidate routes (server/routes/candidates.ts). */
import type { DesignInput } from '../schemas/design.ts';

/** A candidate as GET/POST /api/studies/:id/candidates and PATCH /api/candidates/:id return it. */
export interface CandidateRow {
  id: string;
  studyId: string;
  name: string;
  design: DesignInput;
  notes: string;
  position: number;
  /** The study's target sheet that judges it; null: the study's first. */
  targetSheetId?: string | null;
  createdAt: string;
  updatedAt: string;
}
