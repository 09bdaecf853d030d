import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * The change log: every accepted change of a club, numbered by a per-club sequence given out
 * under the club's lock, so sequence order is commit order and a pull can never skip a row.
 * It doubles as each record's version history.
 */
@Entity('sync_changes')
@Index('ix_sync_changes_record', ['recordId', 'version'])
export class Change {
  @PrimaryColumn({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @PrimaryColumn({ type: 'bigint' })
  seq: string;

  @Column({ type: 'text' })
  kind: string;

  @Column({ name: 'record_id', type: 'uuid' })
  recordId: string;

  @Column({ type: 'int' })
  version: number;

  @Column({ name: 'mutation_id', type: 'uuid', nullable: true })
  mutationId: string | null;

  @Column({ name: 'device_id', type: 'text' })
  deviceId: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'text' })
  hlc: string;

  /** The values this change wrote (after merging), for the record's history. */
  @Column({ type: 'jsonb' })
  patch: Record<string, unknown>;

  @Column({ type: 'boolean', default: false })
  deleted: boolean;

  @Column({ type: 'text' })
  status: string;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
