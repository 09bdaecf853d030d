import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Service records name the parts fitted; records from before this hold none. */
export class ServiceParts1796170000000 implements MigrationInterface {
  name = 'ServiceParts1796170000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "service_records" ADD "parts" text`);
    await queryRunner.query(`UPDATE "service_records" SET "parts" = '' WHERE "parts" IS NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "service_records" DROP COLUMN "parts"`);
  }
}
