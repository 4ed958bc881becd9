import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { DeviceSweepSpec } from '../../shared/devices/device-sweep-spec.ts';

export const SWEEP_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type SweepStatus = (typeof SWEEP_STATUSES)[number];
export const FINISHED_STATUSES: ReadonlySet<SweepStatus> = new Set(['done', 'failed', 'cancelled']);

/**
 * A run of the engine over a grid, in one study. Its chunks, points and design rows live in sweep_chunks,
 * sweep_points and sweep_designs (written with plain SQL in batches, see server/sweeps/).
 */
@Entity({ name: 'sweeps' })
export class Sweep {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text' })
  name!: string;

  /** The grid of designs; null for a sweep over a device (then `device` says what varies). */
  @Column({ type: 'jsonb', nullable: true })
  grid!: Record<string, unknown> | null;

  /** A sweep over a device: the frozen inputs its worker threads compute (shared/devices/device-sweep-spec.ts). */
  @Column({ type: 'jsonb', nullable: true })
  device!: DeviceSweepSpec | null;

  @Column({ type: 'jsonb', default: {} })
  constraints!: Record<string, unknown>;

  /** The target sheet that judges it; null: the study's first sheet. */
  @Column({ type: 'uuid', nullable: true })
  targetSheetId!: string | null;

  @Column({ type: 'text', default: 'queued' })
  status!: SweepStatus;

  @Column({ type: 'integer' })
  pointsTotal!: number;

  @Column({ type: 'integer', default: 0 })
  pointsDone!: number;

  @Column({ type: 'integer', default: 0 })
  pointsFailed!: number;

  @Column({ type: 'integer' })
  designsTotal!: number;

  @Column({ type: 'integer' })
  anglesPerDesign!: number;

  @Column({ type: 'integer' })
  chunksTotal!: number;

  @Column({ type: 'text' })
  engineVersion!: string;

  @Column({ type: 'text', nullable: true })
  error!: string | null;

  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  startedAt!: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  finishedAt!: Date | null;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
