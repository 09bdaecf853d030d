import type { MigrationInterface, QueryRunner } from 'typeorm';
export declare class SyncRecords1796161067131 implements MigrationInterface {
    name: string;
    up(queryRunner: QueryRunner): Promise<void>;
    down(queryRunner: QueryRunner): Promise<void>;
}
