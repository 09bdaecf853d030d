import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Who moved a motor between boats, for the motor's history of moves. */
export class MotorMoveBy1796167010039 implements MigrationInterface {
    name = 'MotorMoveBy1796167010039'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "motor_moves" ADD "moved_by" text`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "motor_moves" DROP COLUMN "moved_by"`);
    }
}
