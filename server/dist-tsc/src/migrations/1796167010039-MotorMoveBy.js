/** Who moved a motor between boats, for the motor's history of moves. */
export class MotorMoveBy1796167010039 {
    name = 'MotorMoveBy1796167010039';
    async up(queryRunner) {
        await queryRunner.query(`ALTER TABLE "motor_moves" ADD "moved_by" text`);
    }
    async down(queryRunner) {
        await queryRunner.query(`ALTER TABLE "motor_moves" DROP COLUMN "moved_by"`);
    }
}
//# sourceMappingURL=1796167010039-MotorMoveBy.js.map