import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { ConflictFields, Writer } from '@/shared/api/sync';

/** A conflict copy (sync/SPEC.md S20), private to the record's owner. */
@Entity('sync_conflicts')
export class SyncConflict {
  @PrimaryColumn({ type: 'varchar', length: 120 })
  id: string;

  @Index()
  @Column({ type: 'varchar', length: 36 })
  ownerId: string;

  @Column({ type: 'simple-json' })
  fields: ConflictFields;

  @Column({ type: 'integer' })
  version: number;

  @Column({ type: 'simple-json' })
  writers: Record<string, Writer>;
}
