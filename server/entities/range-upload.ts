import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { MeasurementAnalysis } from '../../shared/bench/analyse-measurement.ts';
import type { RangeData } from '../../shared/bench/parse-range-csv.ts';

export interface UploadBeam {
  azDeg: number;
  elDeg: number;
  codes: number[];
}

/** One measured pattern file from the range, tied to a candidate and the beam (codes) it was taken with. */
@Entity({ name: 'range_uploads' })
export class RangeUpload {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'uuid' })
  candidateId!: string;

  @Column({ type: 'jsonb' })
  beam!: UploadBeam;

  /** Uploads with the same set name form a set (e.g. one module at several steering angles). */
  @Column({ type: 'text' })
  setName!: string;

  @Column({ type: 'text' })
  originalFilename!: string;

  /** The file exactly as uploaded. */
  @Column({ type: 'bytea', select: false })
  raw!: Buffer;

  @Column({ type: 'jsonb' })
  parsed!: RangeData;

  @Column({ type: 'jsonb' })
  analysis!: MeasurementAnalysis;

  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
