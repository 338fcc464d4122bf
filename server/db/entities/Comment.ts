import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** A comment on a shared sketch, kept with the group it was written in (a re-share elsewhere does not carry it). */
@Entity('comments')
@Index(['sketchId', 'groupId'])
export class Comment {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 100 })
  sketchId: string;

  @Column({ type: 'varchar', length: 36 })
  groupId: string;

  @Column({ type: 'varchar', length: 36 })
  authorId: string;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'datetime' })
  createdAt: Date;

  @Column({ type: 'datetime', nullable: true })
  editedAt: Date | null;
}
