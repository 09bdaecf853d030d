import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Refused changes and their reasons, so a replayed change is refused again rather than taken as done. */
export class SyncRefusals1796180000000 implements MigrationInterface {
  name = 'SyncRefusals1796180000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "sync_refusals" ("club_id" uuid NOT NULL, "mutation_id" uuid NOT NULL, "device_id" text NOT NULL, "error" jsonb NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_e2766eca54316b0fa48151e50fe" PRIMARY KEY ("club_id", "mutation_id"))`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "sync_refusals"`);
  }
}
