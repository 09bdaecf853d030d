import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

export interface ConflictSideRow { deviceId: string; userId: string; hlc: string }

/** Two values for one field; the automatic rule kept one, a supervisor settles it. */
@Entity('sync_conflicts')
@Index('ix_sync_conflicts_open', ['clubId', 'status', 'createdAt'])
export class SyncConflict {
  @PrimaryColumn({ type: 'uuid' })
  id: string;

  @Column({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @Column({ name: 'record_id', type: 'uuid' })
  recordId: string;

  @Column({ type: 'text' })
  kind: string;

  @Column({ type: 'text' })
  field: string;

  @Column({ name: 'kept_value', type: 'jsonb', nullable: true })
  keptValue: unknown;

  @Column({ name: 'overruled_value', type: 'jsonb', nullable: true })
  overruledValue: unknown;

  @Column({ type: 'jsonb' })
  kept: ConflictSideRow;

  @Column({ type: 'jsonb' })
  overruled: ConflictSideRow;

  @Column({ type: 'text', default: 'open' })
  status: 'open' | 'settled';

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;

  @Column({ name: 'settled_by', type: 'uuid', nullable: true })
  settledBy: string | null;

  @Column({ name: 'settled_at', type: 'timestamptz', nullable: true })
  settledAt: Date | null;

  @Column({ name: 'settled_value', type: 'jsonb', nullable: true })
  settledValue: unknown;

  @Column({ type: 'text', nullable: true })
  note: string | null;
}
