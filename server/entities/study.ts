import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const STUDY_VISIBILITIES = ['private', 'team'] as const;
export type StudyVisibility = (typeof STUDY_VISIBILITIES)[number];

/** A saved trade study. Belongs to one team; `private` studies are seen by the owner and explicit shares only. */
@Entity({ name: 'studies' })
export class Study {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  teamId!: string;

  @Column({ type: 'uuid' })
  ownerId!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  /** `team`: every member of the team reads it (and engineers edit); `private`: owner and shares only. */
  @Column({ type: 'text', default: 'team' })
  visibility!: StudyVisibility;

  @Column({ type: 'timestamptz', nullable: true })
  archivedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
