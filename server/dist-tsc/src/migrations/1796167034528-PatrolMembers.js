/** Member cards (name and awards) as a synced kind, and the club's choice of warn or block at sign-on. */
export class PatrolMembers1796167034528 {
    name = 'PatrolMembers1796167034528';
    async up(queryRunner) {
        await queryRunner.query(`CREATE TABLE "members" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "member_id" text, "display_name" text, "awards" jsonb, CONSTRAINT "PK_28b53062261b996d9c99fa12404" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_members_changes" ON "members"  ("club_id", "change_seq") `);
        await queryRunner.query(`ALTER TABLE "clubs" ADD "award_check" text NOT NULL DEFAULT 'warn'`);
    }
    async down(queryRunner) {
        await queryRunner.query(`ALTER TABLE "clubs" DROP COLUMN "award_check"`);
        await queryRunner.query(`DROP INDEX "public"."ix_members_changes"`);
        await queryRunner.query(`DROP TABLE "members"`);
    }
}
//# sourceMappingURL=1796167034528-PatrolMembers.js.map