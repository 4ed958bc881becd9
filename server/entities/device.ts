import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { DeviceLayout } from '../../shared/schemas/device.ts';

/** A device of a study: its outline and one to four modules (candidates on faces, with codebook rules). */
@Entity({ name: 'devices' })
export class Device {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'text' })
  name!: string;

  /** The target sheet that judges it; null: the study's first. */
  @Column({ type: 'uuid', nullable: true })
  targetSheetId!: string | null;

  @Column({ type: 'jsonb' })
  layout!: DeviceLayout;

  @Column({ type: 'text', default: '' })
  notes!: string;

  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  @Column({ type: 'integer', default: 0 })
  position!: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
