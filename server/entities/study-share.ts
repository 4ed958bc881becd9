import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

export const SHARE_ACCESS = ['editor', 'viewer'] as const;
export type ShareAccess = (typeof SHARE_ACCESS)[number];

/** One member's explicit access to a study, granted by its owner. */
@Entity({ name: 'study_shares' })
export class StudyShare {
  @PrimaryColumn({ type: 'uuid' })
  studyId!: string;

  @PrimaryColumn({ type: 'uuid' })
  userId!: string;

  @Column({ type: 'text' })
  access!: ShareAccess;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
