import type { MigrationInterface, QueryRunner } from 'typeorm';
/** Member cards (name and awards) as a synced kind, and the club's choice of warn or block at sign-on. */
export declare class PatrolMembers1796167034528 implements MigrationInterface {
    name: string;
    up(queryRunner: QueryRunner): Promise<void>;
    down(queryRunner: QueryRunner): Promise<void>;
}
