import type { MigrationInterface, QueryRunner } from 'typeorm';
export declare class Foundation1796157054596 implements MigrationInterface {
    name: string;
    up(queryRunner: QueryRunner): Promise<void>;
    down(queryRunner: QueryRunner): Promise<void>;
}
