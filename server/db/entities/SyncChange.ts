import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { RecordType, SyncRecord } from '@/shared/api/sync';

/** The changes log (sync/SPEC.md S9, S10): one row per accepted change, in seq order. */
@Entity('sync_changes')
@Index(['recordType', 'recordId'])
export class SyncChange {
  @PrimaryColumn({ type: 'integer' })
  seq: number;

  @Column({ type: 'varchar', length: 20 })
  recordType: RecordType;

  @Column({ type: 'varchar', length: 120 })
  recordId: string;

  @Index()
  @Column({ type: 'varchar', length: 36 })
  ownerId: string;

  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  groupId: string | null;

  /** The group the record was shared to before this change, when it differs (S22 revoke). */
  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  prevGroupId: string | null;

  @Column({ type: 'simple-json' })
  snapshot: SyncRecord;

  /** A later change of the same record exists and this one moved no scope: pulls skip it. */
  @Column({ type: 'boolean', default: false })
  superseded: boolean;
}
