import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A phone or tablet's last accepted mutation seq, written in the same transaction as its changes. */
@Entity('sync_devices')
export class SyncDevice {
  @PrimaryColumn({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @PrimaryColumn({ name: 'device_id', type: 'text' })
  deviceId: string;

  @Column({ name: 'last_seq', type: 'int', default: 0 })
  lastSeq: number;

  /** The member whose phone this is, from its first push; null for the server's own devices. */
  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @Column({ name: 'last_user_id', type: 'uuid', nullable: true })
  lastUserId: string | null;

  @Column({ name: 'last_push_at', type: 'timestamptz', nullable: true })
  lastPushAt: Date | null;
}
