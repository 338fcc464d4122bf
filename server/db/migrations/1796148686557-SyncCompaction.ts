// Pulls skip changes a later change of the same record supersedes (sync/SPEC.md S15a): a
// flag per change, set for the existing log too, and an index to find a record's changes.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SyncCompaction1796148686557 implements MigrationInterface {
  name = 'SyncCompaction1796148686557';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "sync_changes" ADD COLUMN "superseded" boolean NOT NULL DEFAULT (0)`);
    await q.query(`CREATE INDEX "IDX_3df5539ca09b8e7828c3c38798" ON "sync_changes" ("recordType", "recordId") `);
    await q.query(`UPDATE "sync_changes" SET "superseded" = 1 WHERE "prevGroupId" IS NULL AND "seq" <
      (SELECT MAX(c2."seq") FROM "sync_changes" c2 WHERE c2."recordType" = "sync_changes"."recordType" AND c2."recordId" = "sync_changes"."recordId")`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "IDX_3df5539ca09b8e7828c3c38798"`);
    await q.query(`ALTER TABLE "sync_changes" DROP COLUMN "superseded"`);
  }
}
