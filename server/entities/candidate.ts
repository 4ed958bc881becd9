import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Design } from '../../shared/schemas/design.ts';

/** One array definition a designer is considering, kept inside a study. `design` is the parsed design (defaults filled). */
@Entity({ name: 'candidates' })
export class Candidate {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'jsonb' })
  design!: Design;

  @Column({ type: 'text', default: '' })
  notes!: string;

  /** The target sheet that judges it; null: the study's first sheet. */
  @Column({ type: 'uuid', nullable: true })
  targetSheetId!: string | null;

  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  /** Display order inside the study, from 0. */
  @Column({ type: 'integer', default: 0 })
  position!: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
