import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { Calibration as Offsets } from '../../shared/bench/calibration.ts';

/** A candidate's measured per-channel offsets (one set per candidate; a new upload replaces it). */
@Entity({ name: 'calibrations' })
export class Calibration {
  @PrimaryColumn({ type: 'uuid' })
  candidateId!: string;

  /** [{channel, gainDb, phaseDeg}], channels from 1. */
  @Column({ type: 'jsonb' })
  offsets!: Offsets;

  /** The uploaded file's name, or null when typed in. */
  @Column({ type: 'text', nullable: true })
  sourceFilename!: string | null;

  @Column({ type: 'uuid', nullable: true })
  updatedBy!: string | null;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
