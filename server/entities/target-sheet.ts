import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { TargetSheet as Sheet } from '../../shared/targets/sheet.ts';

/** A study's target sheet: at most one per study. `preset` remembers which preset it started from. */
@Entity({ name: 'target_sheets' })
export class TargetSheetRow {
  @PrimaryColumn({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text', nullable: true })
  preset!: string | null;

  @Column({ type: 'jsonb', default: {} })
  sheet!: Sheet;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
