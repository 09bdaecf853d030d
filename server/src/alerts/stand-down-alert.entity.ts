import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A defect that has just begun to stand its boat down, written by a database trigger in the same
 * transaction as the defect, so no sync path can store one without its alert. The alert service
 * turns each into e-mails to the club's supervisors and marks it sent.
 */
@Entity('stand_down_alerts')
@Index('ix_stand_down_alerts_unsent', ['createdAt'], { where: 'sent_at IS NULL' })
export class StandDownAlert {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @Column({ name: 'defect_id', type: 'uuid' })
  defectId: string;

  /** The defect's version that stood the boat down. */
  @Column({ name: 'defect_version', type: 'int' })
  defectVersion: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  /** How many people were mailed; 0 when mail is off or the club has no supervisor. */
  @Column({ type: 'int', nullable: true })
  recipients: number | null;
}
