// Group feed: comments, board photos, fork links, cached Readout summaries, notifications, settings, activity.
import { MigrationInterface, QueryRunner } from "typeorm";

export class Feed1796146642029 implements MigrationInterface {
    name = 'Feed1796146642029'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "comments" ("id" varchar(36) PRIMARY KEY NOT NULL, "sketchId" varchar(100) NOT NULL, "groupId" varchar(36) NOT NULL, "authorId" varchar(36) NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL, "editedAt" datetime)`);
        await queryRunner.query(`CREATE INDEX "IDX_e8359d55bafcd547564caec13b" ON "comments" ("sketchId", "groupId") `);
        await queryRunner.query(`CREATE TABLE "notifications" ("id" varchar(36) PRIMARY KEY NOT NULL, "userId" varchar(36) NOT NULL, "kind" varchar(30) NOT NULL, "payload" text NOT NULL, "createdAt" datetime NOT NULL, "readAt" datetime)`);
        await queryRunner.query(`CREATE INDEX "IDX_21e65af2f4f242d4c85a92aff4" ON "notifications" ("userId", "createdAt") `);
        await queryRunner.query(`CREATE TABLE "photos" ("id" varchar(36) PRIMARY KEY NOT NULL, "sketchId" varchar(100) NOT NULL, "uploaderId" varchar(36) NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "bytes" integer NOT NULL, "createdAt" datetime NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_15ef84775483997a4f588525e8" ON "photos" ("sketchId") `);
        await queryRunner.query(`CREATE TABLE "sketch_forks" ("sketchId" varchar(100) PRIMARY KEY NOT NULL, "forkedFrom" varchar(100) NOT NULL, "createdAt" datetime NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_601d2084be3b58dac813400e49" ON "sketch_forks" ("forkedFrom") `);
        await queryRunner.query(`CREATE TABLE "sketch_invariants" ("sketchId" varchar(100) PRIMARY KEY NOT NULL, "version" integer NOT NULL, "crossings" integer NOT NULL, "components" integer, "jones" text, "jonesText" varchar(500), "key" varchar(64))`);
        await queryRunner.query(`CREATE INDEX "IDX_6bfde8ff16f78933d2c450d5fc" ON "sketch_invariants" ("key") `);
        await queryRunner.query(`CREATE TABLE "user_activity" ("userId" varchar(36) PRIMARY KEY NOT NULL, "lastActiveAt" datetime NOT NULL)`);
        await queryRunner.query(`CREATE TABLE "user_settings" ("userId" varchar(36) PRIMARY KEY NOT NULL, "settings" text NOT NULL)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "user_settings"`);
        await queryRunner.query(`DROP TABLE "user_activity"`);
        await queryRunner.query(`DROP INDEX "IDX_6bfde8ff16f78933d2c450d5fc"`);
        await queryRunner.query(`DROP TABLE "sketch_invariants"`);
        await queryRunner.query(`DROP INDEX "IDX_601d2084be3b58dac813400e49"`);
        await queryRunner.query(`DROP TABLE "sketch_forks"`);
        await queryRunner.query(`DROP INDEX "IDX_15ef84775483997a4f588525e8"`);
        await queryRunner.query(`DROP TABLE "photos"`);
        await queryRunner.query(`DROP INDEX "IDX_21e65af2f4f242d4c85a92aff4"`);
        await queryRunner.query(`DROP TABLE "notifications"`);
        await queryRunner.query(`DROP INDEX "IDX_e8359d55bafcd547564caec13b"`);
        await queryRunner.query(`DROP TABLE "comments"`);
    }

}
