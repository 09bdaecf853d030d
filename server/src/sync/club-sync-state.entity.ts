import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One row a club: its change counter (locked per push) and the tombstone purge horizon. */
@Entity('sync_club_state')
export class ClubSyncState {
  @PrimaryColumn({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @Column({ name: 'last_seq', type: 'bigint', default: 0 })
  lastSeq: string;

  /** Tombstones up to this sequence are gone: a checkpoint below it must pull afresh. */
  @Column({ name: 'purged_through_seq', type: 'bigint', default: 0 })
  purgedThroughSeq: string;
}
