import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const REVIEW_REQUEST_STATES = ['asked', 'approved', 'changes_requested'] as const;
export type ReviewRequestState = (typeof REVIEW_REQUEST_STATES)[number];

/** One reviewer asked to review one study, and their answer. */
@Entity({ name: 'review_requests' })
export class ReviewRequest {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'uuid' })
  requestedById!: string;

  @Column({ type: 'uuid' })
  reviewerId!: string;

  @Column({ type: 'text', default: 'asked' })
  state!: ReviewRequestState;

  /** What the engineer asked for. */
  @Column({ type: 'text', default: '' })
  message!: string;

  /** The reviewer's answer note. */
  @Column({ type: 'text', default: '' })
  note!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  answeredAt!: Date | null;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
