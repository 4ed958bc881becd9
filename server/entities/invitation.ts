import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { TeamRole } from './user.ts';

/** An admin's offer of team membership to an e-mail address; the link token is stored hashed. */
@Entity({ name: 'invitations' })
export class Invitation {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  role!: TeamRole;

  @Column({ type: 'text', unique: true })
  tokenHash!: string;

  @Column({ type: 'uuid', nullable: true })
  invitedById!: string | null;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  acceptedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
