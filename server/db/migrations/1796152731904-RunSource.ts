// Runs keep the text their diagram came from (a pasted braid word, DT or PD code) in full, so
// the result page, its exports and the e-mail can show what was computed.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RunSource1796152731904 implements MigrationInterface {
  name = 'RunSource1796152731904';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" ADD COLUMN "source" text`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" DROP COLUMN "source"`);
  }
}
