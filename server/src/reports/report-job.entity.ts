import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type ReportJobState = 'queued' | 'working' | 'done' | 'failed';

/** A report asked for and made in the background; the finished PDF is kept with it for a while. */
@Entity('report_jobs')
@Index('ix_report_jobs_club', ['clubId', 'createdAt'])
export class ReportJob {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @Column({ name: 'requested_by', type: 'uuid' })
  requestedBy: string;

  /** Local dates at the club, inclusive. */
  @Column({ name: 'from_date', type: 'text' })
  fromDate: string;

  @Column({ name: 'to_date', type: 'text' })
  toDate: string;

  @Column({ type: 'text', default: 'queued' })
  state: ReportJobState;

  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ type: 'bytea', nullable: true, select: false })
  file: Buffer | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt: Date | null;
}
