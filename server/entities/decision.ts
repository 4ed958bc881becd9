import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One frozen point of the chosen design: its steering and the engine's metrics there. */
export interface FrozenPoint {
  steerAzDeg: number;
  steerElDeg: number;
  metrics: Record<string, unknown>;
}

/** What a decision freezes of the chosen design's results at signing time. */
export interface FrozenMetrics {
  /** Metrics at the design's own steering (null for a sweep design, whose points are the record). */
  at: Record<string, unknown> | null;
  /** Axis the points scan along. */
  axis: 'az' | 'el';
  /** One entry per steering angle (a sweep design's points, or the design evaluated over its scan). */
  points: FrozenPoint[];
  /** Worst-case figures over the points (shared/targets figuresFromPoints). */
  figures: Record<string, unknown>;
  /** The steering angles the figures are worst cases over, in words (printed in the packet beside them). */
  basis?: string;
}

export interface DecisionAlternative {
  label: string;
  reason: string;
  source?: string | null;
}

/**
 * A reviewer's sign-off on a study: the chosen design with its metrics and engine version frozen.
 * Once signed_at is set the database refuses UPDATE and DELETE of the row (trigger in the review migration).
 */
@Entity({ name: 'decisions' })
export class Decision {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  studyId!: string;

  @Column({ type: 'uuid' })
  decidedById!: string;

  /** How the design is named in the history and the packet (a candidate's name, a sweep design, or its parameters). */
  @Column({ type: 'text' })
  label!: string;

  /** Engine design parameters, as evaluated. */
  @Column({ type: 'jsonb' })
  design!: Record<string, unknown>;

  @Column({ type: 'jsonb' })
  metrics!: FrozenMetrics;

  @Column({ type: 'text' })
  engineVersion!: string;

  /** The sweep design this was chosen from ("<sweep id>:<design index>"), or null for a design given directly. */
  @Column({ type: 'text', nullable: true })
  source!: string | null;

  @Column({ type: 'text' })
  rationale!: string;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  alternatives!: DecisionAlternative[];

  @Column({ type: 'timestamptz', nullable: true })
  signedAt!: Date | null;

  @Column({ type: 'uuid', nullable: true })
  supersedesId!: string | null;

  /** The target sheet the design was judged against (null: the study had none). */
  @Column({ type: 'uuid', nullable: true })
  targetSheetId!: string | null;

  /** The sheet as it was when judged, so later edits of the sheet never change what was signed. */
  @Column({ type: 'jsonb', nullable: true })
  targetSheet!: Record<string, unknown> | null;

  /** The sheet's limits the design failed (limit keys), empty when it passed every one. */
  @Column({ type: 'text', array: true, default: () => "'{}'" })
  failedLimits!: string[];

  /** Why it was signed although it fails limits; required then. */
  @Column({ type: 'text', default: '' })
  justification!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
