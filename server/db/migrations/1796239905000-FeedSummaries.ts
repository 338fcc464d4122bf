// Feed summaries are computed off the request thread when a sketch is written, once per
// diagram: each keeps the hash of the diagram it summarises, so an edit that leaves the diagram
// alone (a title) moves the summary to the new version instead of computing it again. Older
// rows have none; sketches without a summary of their version are computed at start.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class FeedSummaries1796239905000 implements MigrationInterface {
  name = 'FeedSummaries1796239905000';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "sketch_invariants" ADD COLUMN "diagramHash" varchar(64)`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "sketch_invariants" DROP COLUMN "diagramHash"`);
  }
}
