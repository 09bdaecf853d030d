import type { MigrationInterface, QueryRunner } from 'typeorm';
/** Who moved a motor between boats, for the motor's history of moves. */
export declare class MotorMoveBy1796167010039 implements MigrationInterface {
    name: string;
    up(queryRunner: QueryRunner): Promise<void>;
    down(queryRunner: QueryRunner): Promise<void>;
}
