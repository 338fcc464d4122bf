import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity('groups')
export class Group {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 100 })
  name: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
