import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Readout summary of a sketch at one version, computed from its PD code in the job pool when
 * the sketch is written (server/feed/summaries.ts). `diagramHash` names the diagram it
 * summarises (null on rows from before it was kept); `key` (crossings + Jones) finds sketches
 * with the same invariants, null when not computable.
 */
@Entity('sketch_invariants')
export class SketchInvariant {
  @PrimaryColumn({ type: 'varchar', length: 100 })
  sketchId: string;

  @Column({ type: 'integer' })
  version: number;

  @Column({ type: 'varchar', length: 64, nullable: true })
  diagramHash: string | null;

  @Column({ type: 'integer' })
  crossings: number;

  @Column({ type: 'integer', nullable: true })
  components: number | null;

  @Column({ type: 'text', nullable: true })
  jones: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  jonesText: string | null;

  @Index()
  @Column({ type: 'varchar', length: 64, nullable: true })
  key: string | null;
}
