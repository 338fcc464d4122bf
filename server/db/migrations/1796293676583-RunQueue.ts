// Runs go through a queue that may be on other machines: each computation keeps its turn in its
// starter's line (fair share: the k-th live run of a person waits behind everyone's earlier
// turns) and the name of the worker that ran it.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RunQueue1796293676583 implements MigrationInterface {
  name = 'RunQueue1796293676583';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" ADD COLUMN "turn" integer NOT NULL DEFAULT (1)`);
    await q.query(`ALTER TABLE "runs" ADD COLUMN "worker" varchar(200)`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "runs" DROP COLUMN "worker"`);
    await q.query(`ALTER TABLE "runs" DROP COLUMN "turn"`);
  }
}
