import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { UserSettings as Settings } from '@/shared/api/notifications';

/** A row only once the user changes a setting; otherwise the defaults apply. */
@Entity('user_settings')
export class UserSettings {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'simple-json' })
  settings: Settings;
}
