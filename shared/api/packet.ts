/** Response shape of GET /api/studies/:id/packet (server/services/packet-service.ts); the PDF draws the same data. */
import type { StudyReview } from '../schemas/review.ts';
import type { DecisionRow } from './review.ts';

export interface PacketRankedRow {
  rank: number;
  label: string;
  verdict: string;
  figures: Record<string, number | null>;
}

/** GET /api/studies/:id/packet. */
export interface Packet {
  study: { id: string; name: string; teamName: string };
  generatedAt: string;
  engineVersion: string;
  job: string;
  targetSheet: { name: string | null; limits: { key: string; label: string; value: string }[]; judgedDecision?: boolean } | null;
  rankObjective: string;
  ranked: PacketRankedRow[];
  sweepRanked: { sweepId: string; sweepName: string; summary: string; basis?: string; rows: (PacketRankedRow & { designIndex: number; parameters: string })[] } | null;
  decision: DecisionRow | null;
  history: DecisionRow[];
  chart: { axis: 'az' | 'el'; points: { angleDeg: number; hpbwAzDeg: number | null; hpbwElDeg: number | null; scanLossDb: number | null; gainAtSteerDbi?: number | null }[] } | null;
  exposure: { eirpDbm: number; distanceM: number; referenceWm2: number } | null;
  exposureBasis: string | null;
  review: StudyReview;
}
