import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Readout summary of a sketch at one version, computed from its PD code on first read. `key`
 * (crossings + Jones) finds sketches with the same invariants; null when not computable.
 */
@Entity('sketch_invariants')
export class SketchInvariant {
  @PrimaryColumn({ type: 'varchar', length: 100 })
  sketchId: string;

  @Column({ type: 'integer' })
  version: number;

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
