// Each user carries a token version that every access token repeats; bumping it (sign out
// everywhere, a new password) makes all older tokens invalid at once.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class TokenVersion1796239057918 implements MigrationInterface {
  name = 'TokenVersion1796239057918';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "users" ADD COLUMN "tokenVersion" integer NOT NULL DEFAULT (0)`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "users" DROP COLUMN "tokenVersion"`);
  }
}
