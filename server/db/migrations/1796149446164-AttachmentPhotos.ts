// Device photos go through the photo pipeline (re-encoded, thumbnailed, in the PhotoStore): the
// attachments table keeps their size and shape; `data` stays only for rows from before, which
// are re-encoded on first use (server/uploads/use-cases.ts).
import type { MigrationInterface, QueryRunner } from 'typeorm';

const table = (name: string, data: string) =>
  `CREATE TABLE "${name}" ("sha256" varchar(64) PRIMARY KEY NOT NULL, "size" integer NOT NULL, "mimeType" varchar(50) NOT NULL, "data" blob${data}, "createdAt" datetime NOT NULL DEFAULT (datetime('now'))${data ? '' : ', "width" integer, "height" integer'})`;

export class AttachmentPhotos1796149446164 implements MigrationInterface {
  name = 'AttachmentPhotos1796149446164';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(table('temporary_attachments', ''));
    await q.query(`INSERT INTO "temporary_attachments"("sha256", "size", "mimeType", "data", "createdAt") SELECT "sha256", "size", "mimeType", "data", "createdAt" FROM "attachments"`);
    await q.query(`DROP TABLE "attachments"`);
    await q.query(`ALTER TABLE "temporary_attachments" RENAME TO "attachments"`);
  }

  /** Rows made since (bytes in the PhotoStore only) cannot go back: they are dropped. */
  public async down(q: QueryRunner): Promise<void> {
    await q.query(table('temporary_attachments', ' NOT NULL'));
    await q.query(`INSERT INTO "temporary_attachments"("sha256", "size", "mimeType", "data", "createdAt") SELECT "sha256", "size", "mimeType", "data", "createdAt" FROM "attachments" WHERE "data" IS NOT NULL`);
    await q.query(`DROP TABLE "attachments"`);
    await q.query(`ALTER TABLE "temporary_attachments" RENAME TO "attachments"`);
  }
}
