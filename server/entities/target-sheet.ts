import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { TargetSheet as Sheet } from '../../shared/targets/sheet.ts';

/**
 * One of a study's target sheets. A study holds several (a handset sheet, a small-cell sheet…); candidates, sweeps
 * and devices name the one that judges them. The first by position is the study's default. `preset` remembers
 * which preset it started from; its name is `sheet.name`.
 */
@Entity({ name: 'target_sheets' })
export class TargetSheetRow {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text', nullable: true })
  preset!: string | null;

  @Column({ type: 'jsonb', default: {} })
  sheet!: Sheet;

  /** Display order inside the study, from 0; the first is the default sheet. */
  @Column({ type: 'integer', default: 0 })
  position!: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
