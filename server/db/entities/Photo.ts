import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** A board photo of a sketch; the bytes live in the PhotoStore under `${id}/full` and `${id}/thumb`. */
@Entity('photos')
export class Photo {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index()
  @Column({ type: 'varchar', length: 100 })
  sketchId: string;

  @Column({ type: 'varchar', length: 36 })
  uploaderId: string;

  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  @Column({ type: 'integer' })
  bytes: number;

  @Column({ type: 'datetime' })
  createdAt: Date;
}
