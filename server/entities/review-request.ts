import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { REVIEW_REQUEST_STATES, type ReviewRequestState } from '../../shared/schemas/review.ts';

export { REVIEW_REQUEST_STATES, type ReviewRequestState };

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
