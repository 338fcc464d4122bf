// Accounts, groups, memberships and invitations. Constraint and index names are the ones
// TypeORM derives from the entities, so `npm run migration:generate` finds nothing to add.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1796145751477 implements MigrationInterface {
  name = 'Foundation1796145751477';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "users" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "email" varchar(254) NOT NULL,
      "displayName" varchar(80) NOT NULL,
      "passwordHash" varchar(100) NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      CONSTRAINT "UQ_97672ac88f789774dd47f7c8be3" UNIQUE ("email"))`);
    await q.query(`CREATE TABLE "groups" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "name" varchar(100) NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await q.query(`CREATE TABLE "memberships" (
      "groupId" varchar(36) NOT NULL,
      "userId" varchar(36) NOT NULL,
      "role" varchar(10) NOT NULL,
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      CONSTRAINT "FK_0cd1858e93877b2ef239d4cf92c" FOREIGN KEY ("groupId") REFERENCES "groups" ("id") ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT "FK_187d573e43b2c2aa3960df20b78" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE CASCADE ON UPDATE NO ACTION,
      PRIMARY KEY ("groupId", "userId"))`);
    await q.query(`CREATE INDEX "IDX_187d573e43b2c2aa3960df20b7" ON "memberships" ("userId")`);
    await q.query(`CREATE TABLE "invitations" (
      "id" varchar(36) PRIMARY KEY NOT NULL,
      "groupId" varchar(36) NOT NULL,
      "email" varchar(254) NOT NULL,
      "role" varchar(10) NOT NULL,
      "tokenHash" varchar(64) NOT NULL,
      "invitedById" varchar(36) NOT NULL,
      "expiresAt" datetime NOT NULL,
      "acceptedAt" datetime,
      "acceptedById" varchar(36),
      "createdAt" datetime NOT NULL DEFAULT (datetime('now')),
      CONSTRAINT "UQ_a6eb6f2543de8a5a4c148b32a18" UNIQUE ("tokenHash"),
      CONSTRAINT "FK_a704d320fc52f862c40d7787d69" FOREIGN KEY ("groupId") REFERENCES "groups" ("id") ON DELETE CASCADE ON UPDATE NO ACTION,
      CONSTRAINT "FK_b60325e5302be0dad38b423314c" FOREIGN KEY ("invitedById") REFERENCES "users" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await q.query(`CREATE INDEX "IDX_a704d320fc52f862c40d7787d6" ON "invitations" ("groupId")`);
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "invitations"`);
    await q.query(`DROP TABLE "memberships"`);
    await q.query(`DROP TABLE "groups"`);
    await q.query(`DROP TABLE "users"`);
  }
}
