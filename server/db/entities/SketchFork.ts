import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** A sketch made by forking another: the link back to the original. */
@Entity('sketch_forks')
export class SketchFork {
  @PrimaryColumn({ type: 'varchar', length: 100 })
  sketchId: string;

  @Index()
  @Column({ type: 'varchar', length: 100 })
  forkedFrom: string;

  @Column({ type: 'datetime' })
  createdAt: Date;
}
