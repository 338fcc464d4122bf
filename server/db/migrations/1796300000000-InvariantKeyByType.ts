// The "same invariants" key now stands for the knot type (components, Jones, determinant,
// signature) instead of crossings and Jones: stored summaries are dropped, and the start-up
// backfill (server/feed/summaries.ts) computes them again in the job pool.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class InvariantKeyByType1796300000000 implements MigrationInterface {
  name = 'InvariantKeyByType1796300000000';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`DELETE FROM "sketch_invariants"`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`DELETE FROM "sketch_invariants"`);
  }
}
