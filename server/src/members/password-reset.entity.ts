import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A mailed link to set a new password: only a SHA-256 of its secret is kept; it works once. */
@Entity('password_resets')
export class PasswordReset {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('ix_password_resets_user')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ name: 'secret_hash', type: 'text' })
  secretHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  /** Set when the link is used, or when a newer link replaces it. */
  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
