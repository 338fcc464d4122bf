import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity('users')
export class User {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  /** Stored lower-cased (shared/api/auth.ts Email normalises), so uniqueness is case-blind. */
  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ type: 'varchar', length: 80 })
  displayName: string;

  @Column({ type: 'varchar', length: 100 })
  passwordHash: string;

  /** Repeated in every access token; bumped to revoke them all (auth/tokens.ts). */
  @Column({ type: 'integer', default: 0 })
  tokenVersion: number;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
