import type { MigrationInterface, QueryRunner } from 'typeorm';
/**
 * The supervisor's desk: invitations, password resets, report jobs, stand-down alerts and award
 * reminders; indexes for the desk's tables; and the trigger that writes a stand-down alert in the
 * same transaction as the defect that stands a boat down.
 */
export declare class SupervisorDesk1796167688603 implements MigrationInterface {
    name: string;
    up(queryRunner: QueryRunner): Promise<void>;
    down(queryRunner: QueryRunner): Promise<void>;
}
