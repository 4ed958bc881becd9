import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Team } from './team.ts';

export const TEAM_ROLES = ['admin', 'engineer', 'reviewer'] as const;
export type TeamRole = (typeof TEAM_ROLES)[number];

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** Stored lower-cased; unique across the installation. */
  @Index({ unique: true })
  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  name!: string;

  /** argon2id hash; null until an invited user sets a password. */
  @Column({ type: 'text', nullable: true })
  passwordHash!: string | null;

  @Column({ type: 'text' })
  role!: TeamRole;

  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne('Team', (team: Team) => team.members, { onDelete: 'CASCADE' })
  team?: Team;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
