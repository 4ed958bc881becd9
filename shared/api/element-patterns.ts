/** Response shape of the element-pattern routes (server/routes/element-patterns.ts). */

/** One uploaded pattern as GET /api/studies/:id/element-patterns lists it (POST adds `pattern`). */
export interface PatternSummary {
  id: string;
  studyId: string;
  name: string;
  originalFilename: string;
  createdAt: string;
  azStepDeg: number;
  elStepDeg: number;
  azRangeDeg: [number, number];
  elRangeDeg: [number, number];
  peakGainDbi: number;
}
