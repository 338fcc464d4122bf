import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { NotificationKind } from '@/shared/api/notifications';

@Entity('notifications')
@Index(['userId', 'createdAt'])
export class Notification {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 30 })
  kind: NotificationKind;

  @Column({ type: 'simple-json' })
  payload: Record<string, unknown>;

  @Column({ type: 'datetime' })
  createdAt: Date;

  @Column({ type: 'datetime', nullable: true })
  readAt: Date | null;
}
