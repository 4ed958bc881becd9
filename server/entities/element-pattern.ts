import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { ElementPattern } from '../../shared/schemas/element-pattern.ts';

/** An embedded element pattern uploaded to a study (gain in dBi on a regular az/el grid); designs use it by id. */
@Entity({ name: 'element_patterns' })
export class ElementPatternRow {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  originalFilename!: string;

  /** The file exactly as uploaded. */
  @Column({ type: 'bytea', select: false })
  raw!: Buffer;

  /** The parsed grid {azDeg, elDeg, gainDbi}, el-major. */
  @Column({ type: 'jsonb' })
  pattern!: ElementPattern;

  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
