import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { Writer } from '@/shared/api/sync';
import type { Diagram } from '@/shared/api/sketches';

/** A sketch as the server holds it (sync/SPEC.md S1-S4); `writers` serves the merge (S18). */
@Entity('sketches')
export class Sketch {
  @PrimaryColumn({ type: 'varchar', length: 100 })
  id: string;

  @Index()
  @Column({ type: 'varchar', length: 36 })
  ownerId: string;

  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  groupId: string | null;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'varchar', length: 300 })
  seenAt: string;

  @Column({ type: 'text' })
  notes: string;

  @Column({ type: 'simple-json' })
  tags: string[];

  @Column({ type: 'simple-json' })
  diagram: Diagram;

  @Column({ type: 'simple-json' })
  attachments: string[];

  @Column({ type: 'varchar', length: 40 })
  createdAt: string;

  @Column({ type: 'varchar', length: 40 })
  updatedAt: string;

  @Column({ type: 'boolean' })
  deleted: boolean;

  @Column({ type: 'integer' })
  version: number;

  @Column({ type: 'simple-json' })
  writers: Record<string, Writer>;
}
