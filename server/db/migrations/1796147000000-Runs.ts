// Runs: heavy computations and cable-sweep cells (server/runs). Written in the shape
// `npm run migration:generate` gives for server/db/entities/Run.ts (same index names).
import type { MigrationInterface, QueryRunner } from 'typeorm';

const indexed = { status: 'IDX_960d03633e2a14a4bdf668aa1e', sketchId: 'IDX_48e53c3fe889d1cf981bbe9364', groupId: 'IDX_744e1f202e4d738fcd6ee8af31', startedBy: 'IDX_fcf90109c968cb4d042f4d1971', parentRunId: 'IDX_aaaea7e6127a655d678f23b60f', diagramKey: 'IDX_e7214386080483151c299d0ea3' };

export class Runs1796147000000 implements MigrationInterface {
    name = 'Runs1796147000000';

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "runs" ("id" varchar(36) PRIMARY KEY NOT NULL, "kind" varchar(20) NOT NULL, "status" varchar(20) NOT NULL, "label" varchar(120) NOT NULL, "sketchId" varchar(100), "groupId" varchar(36), "startedBy" varchar(36) NOT NULL, "parentRunId" varchar(36), "diagram" text NOT NULL, "diagramKey" varchar(64) NOT NULL, "crossings" integer NOT NULL, "ring" varchar(10) NOT NULL, "reduced" boolean NOT NULL, "sweep" text, "cable" text, "progress" real NOT NULL, "complexSize" integer NOT NULL, "result" text, "error" text, "reusedFrom" varchar(36), "createdAt" varchar(40) NOT NULL, "startedAt" varchar(40), "finishedAt" varchar(40))`);
        for (const [column, name] of Object.entries(indexed)) {
            await queryRunner.query(`CREATE INDEX "${name}" ON "runs" ("${column}") `);
        }
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const name of Object.values(indexed).reverse()) await queryRunner.query(`DROP INDEX "${name}"`);
        await queryRunner.query(`DROP TABLE "runs"`);
    }
}
