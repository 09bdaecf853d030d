import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { Role } from '@breakline/sync-protocol';

/**
 * An invitation to join a club by e-mail. Only a SHA-256 of the link's secret is kept; the link
 * works once, until it expires or a newer invitation to the same address replaces it.
 */
@Entity('invites')
@Index('ix_invites_club', ['clubId', 'createdAt'])
@Index('ix_invites_club_email', ['clubId', 'email'])
export class Invite {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'club_id', type: 'uuid' })
  clubId: string;

  /** Lower-cased, like users.email. */
  @Column({ type: 'text' })
  email: string;

  @Column({ type: 'text' })
  role: Role;

  @Column({ name: 'secret_hash', type: 'text' })
  secretHash: string;

  @Column({ name: 'invited_by', type: 'uuid' })
  invitedBy: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'accepted_by', type: 'uuid', nullable: true })
  acceptedBy: string | null;

  /** Withdrawn by an admin or replaced by a newer invitation. */
  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
