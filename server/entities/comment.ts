import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export const COMMENT_TARGET_KINDS = ['study', 'design', 'chart'] as const;
export type CommentTargetKind = (typeof COMMENT_TARGET_KINDS)[number];

/** A remark on a study, a design row or a chart, with the exact view the author saw so a reader can reopen it. */
@Entity({ name: 'comments' })
export class Comment {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'uuid' })
  authorId!: string;

  @Column({ type: 'text' })
  body!: string;

  @Column({ type: 'text', default: 'study' })
  targetKind!: CommentTargetKind;

  /** Which design row or chart (a sweep design id, a candidate id, a chart key); null for the study itself. */
  @Column({ type: 'text', nullable: true })
  targetRef!: string | null;

  /** The client's view state when the comment was written (tab, filters, sort, selected point, chart axes…). */
  @Column({ type: 'jsonb', nullable: true })
  viewState!: Record<string, unknown> | null;

  /** Team members named with @name, resolved to user ids. */
  @Column({ type: 'uuid', array: true, default: () => "'{}'" })
  mentions!: string[];

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
