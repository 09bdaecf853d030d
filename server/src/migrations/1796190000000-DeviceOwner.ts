import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A device belongs to the member who first pushes from it; devices from before take theirs on their next push. */
export class DeviceOwner1796190000000 implements MigrationInterface {
  name = 'DeviceOwner1796190000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "sync_devices" ADD "user_id" uuid`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "sync_devices" DROP COLUMN "user_id"`);
  }
}
