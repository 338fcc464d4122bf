// Runs may also compute the s-invariant of a knot (the result then carries s); older runs did not.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RunComputeS1796239288889 implements MigrationInterface {
  name = 'RunComputeS1796239288889';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" ADD COLUMN "computeS" boolean NOT NULL DEFAULT (0)`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" DROP COLUMN "computeS"`);
  }
}
