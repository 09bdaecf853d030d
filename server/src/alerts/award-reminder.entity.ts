import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** That a lapsing award was announced, so each award's expiry date is mailed about once. */
@Entity('award_reminders')
@Index('ux_award_reminders', ['clubId', 'cardId', 'awardId', 'expiresOn'], { unique: true })
export class AwardReminder {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'club_id', type: 'uuid' })
  clubId: string;

  /** The member card (its id is the membership's). */
  @Column({ name: 'card_id', type: 'uuid' })
  cardId: string;

  @Column({ name: 'award_id', type: 'text' })
  awardId: string;

  @Column({ name: 'expires_on', type: 'text' })
  expiresOn: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
