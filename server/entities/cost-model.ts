import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { CostModel } from '../../shared/cost/cost-model.ts';

/** A study's cost-and-power model (at most one per study); `version` counts saves, so figures can name theirs. */
@Entity({ name: 'study_cost_models' })
export class StudyCostModel {
  @PrimaryColumn({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'jsonb' })
  model!: CostModel;

  @Column({ type: 'integer', default: 1 })
  version!: number;

  @Column({ type: 'uuid', nullable: true })
  updatedBy!: string | null;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
