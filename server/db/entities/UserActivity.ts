import { Column, Entity, PrimaryColumn } from 'typeorm';

/** When a user last made a signed-in request, written at most once a minute (server/activity). */
@Entity('user_activity')
export class UserActivity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'datetime' })
  lastActiveAt: Date;
}
