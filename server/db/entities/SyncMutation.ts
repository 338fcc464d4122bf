import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { PushResult } from '@/shared/api/sync';

/** Every applied mutation id with its answer, for idempotent push (sync/SPEC.md S12). */
@Entity('sync_mutations')
export class SyncMutation {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  mutationId: string;

  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 100 })
  deviceId: string;

  @Column({ type: 'simple-json' })
  result: PushResult;
}
