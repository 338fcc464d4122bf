import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { Role } from '@/shared/api/groups';
import { Group } from './Group';
import { User } from './User';

@Entity('memberships')
export class Membership {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  groupId: string;

  // The primary key (groupId, userId) serves lookups by group; this index serves "my groups".
  @Index()
  @PrimaryColumn({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 10 })
  role: Role;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @ManyToOne(() => Group, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'groupId' })
  group?: Group;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId' })
  user?: User;
}
