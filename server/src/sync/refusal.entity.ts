import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import type { MutationError } from '@breakline/sync-protocol';

/**
 * A change the server refused, with its reason, so that a phone whose answer was lost on the way
 * and sends the change again hears the same refusal, not "already done".
 */
@Entity('sync_refusals')
export class SyncRefusal {
  @PrimaryColumn({ name: 'club_id', type: 'uuid' })
  clubId: string;

  @PrimaryColumn({ name: 'mutation_id', type: 'uuid' })
  mutationId: string;

  @Column({ name: 'device_id', type: 'text' })
  deviceId: string;

  @Column({ type: 'jsonb' })
  error: MutationError;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
