import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A message received by the local fake SMTP server, parsed, with its raw source. */
@Entity({ name: 'mail_messages' })
export class MailMessage {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  /** From the X-Lobewise-Team header our mailer sets; null for mail from elsewhere (shown to nobody). */
  @Index()
  @Column({ type: 'uuid', nullable: true })
  teamId!: string | null;

  /** From the X-Lobewise-Sent-By header: the user whose action sent it (an admin sees what they sent). */
  @Index()
  @Column({ type: 'uuid', nullable: true })
  sentBy!: string | null;

  @Column({ type: 'text', nullable: true })
  messageId!: string | null;

  @Column({ type: 'text' })
  fromAddress!: string;

  @Column({ type: 'text', array: true })
  toAddresses!: string[];

  @Column({ type: 'text' })
  subject!: string;

  @Column({ type: 'text' })
  textBody!: string;

  @Column({ type: 'text', nullable: true })
  htmlBody!: string | null;

  @Column({ type: 'text' })
  raw!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  receivedAt!: Date;
}
