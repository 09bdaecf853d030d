/**
 * The supervisor's desk: invitations, password resets, report jobs, stand-down alerts and award
 * reminders; indexes for the desk's tables; and the trigger that writes a stand-down alert in the
 * same transaction as the defect that stands a boat down.
 */
export class SupervisorDesk1796167688603 {
    name = 'SupervisorDesk1796167688603';
    async up(queryRunner) {
        await queryRunner.query(`CREATE TABLE "invites" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "club_id" uuid NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "secret_hash" text NOT NULL, "invited_by" uuid NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "accepted_at" TIMESTAMP WITH TIME ZONE, "accepted_by" uuid, "revoked_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_aa52e96b44a714372f4dd31a0af" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_invites_club_email" ON "invites"  ("club_id", "email") `);
        await queryRunner.query(`CREATE INDEX "ix_invites_club" ON "invites"  ("club_id", "created_at") `);
        await queryRunner.query(`CREATE TABLE "password_resets" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "secret_hash" text NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_4816377aa98211c1de34469e742" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_password_resets_user" ON "password_resets"  ("user_id") `);
        await queryRunner.query(`CREATE TABLE "report_jobs" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "club_id" uuid NOT NULL, "requested_by" uuid NOT NULL, "from_date" text NOT NULL, "to_date" text NOT NULL, "state" text NOT NULL DEFAULT 'queued', "error" text, "file" bytea, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "finished_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_0c1416b1e9ba757ceae79b598e8" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_report_jobs_club" ON "report_jobs"  ("club_id", "created_at") `);
        await queryRunner.query(`CREATE TABLE "stand_down_alerts" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "club_id" uuid NOT NULL, "defect_id" uuid NOT NULL, "defect_version" integer NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "sent_at" TIMESTAMP WITH TIME ZONE, "recipients" integer, CONSTRAINT "PK_c4c9d95cf7a4b28d98e64597f47" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_stand_down_alerts_unsent" ON "stand_down_alerts"  ("created_at") WHERE sent_at IS NULL`);
        await queryRunner.query(`CREATE TABLE "award_reminders" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "club_id" uuid NOT NULL, "card_id" uuid NOT NULL, "award_id" text NOT NULL, "expires_on" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_99a4e215ba75061812dae127ef8" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "ux_award_reminders" ON "award_reminders"  ("club_id", "card_id", "award_id", "expires_on") `);
        await queryRunner.query(`CREATE INDEX "ix_checks_review_time" ON "checks"  ("club_id", "started_at") `);
        await queryRunner.query(`CREATE INDEX "ix_checks_review_boat" ON "checks"  ("club_id", "boat_id", "started_at") `);
        await queryRunner.query(`CREATE INDEX "ix_defects_review_time" ON "defects"  ("club_id", "reported_at") `);
        await queryRunner.query(`CREATE INDEX "ix_defects_review_boat" ON "defects"  ("club_id", "boat_id", "reported_at") `);
        await queryRunner.query(`CREATE INDEX "ix_defects_review_status" ON "defects"  ("club_id", "status", "reported_at") `);
        await queryRunner.query(`CREATE INDEX "ix_trips_review_time" ON "trips"  ("club_id", "launched_at") `);
        await queryRunner.query(`CREATE INDEX "ix_trips_review_boat" ON "trips"  ("club_id", "boat_id", "launched_at") `);
        await queryRunner.query(`CREATE INDEX "ix_incident_notes_review_time" ON "incident_notes"  ("club_id", "occurred_at") `);
        // A defect "stands down" while its severity is stand-down and it is open, assigned or repaired
        // (only verification or rejection closes it). An alert is written when one starts to: new, raised
        // to stand-down, reopened or undeleted. Written by hand: TypeORM does not manage triggers.
        await queryRunner.query(`CREATE FUNCTION "stand_down_alert"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.severity = 'stand-down' AND NEW.status IN ('open', 'assigned', 'repaired') AND NOT NEW.deleted
     AND (TG_OP = 'INSERT' OR NOT coalesce(OLD.severity = 'stand-down' AND OLD.status IN ('open', 'assigned', 'repaired') AND NOT OLD.deleted, false)) THEN
    INSERT INTO stand_down_alerts (club_id, defect_id, defect_version) VALUES (NEW.club_id, NEW.id, NEW.version);
  END IF;
  RETURN NULL;
END
$$`);
        // The WHEN clause keeps the function from running at all for the many rows that are not stand-down.
        await queryRunner.query(`CREATE TRIGGER "tr_defects_stand_down" AFTER INSERT OR UPDATE ON "defects" FOR EACH ROW WHEN (NEW.severity = 'stand-down') EXECUTE FUNCTION "stand_down_alert"()`);
    }
    async down(queryRunner) {
        await queryRunner.query(`DROP TRIGGER "tr_defects_stand_down" ON "defects"`);
        await queryRunner.query(`DROP FUNCTION "stand_down_alert"()`);
        await queryRunner.query(`DROP INDEX "public"."ix_incident_notes_review_time"`);
        await queryRunner.query(`DROP INDEX "public"."ix_trips_review_boat"`);
        await queryRunner.query(`DROP INDEX "public"."ix_trips_review_time"`);
        await queryRunner.query(`DROP INDEX "public"."ix_defects_review_status"`);
        await queryRunner.query(`DROP INDEX "public"."ix_defects_review_boat"`);
        await queryRunner.query(`DROP INDEX "public"."ix_defects_review_time"`);
        await queryRunner.query(`DROP INDEX "public"."ix_checks_review_boat"`);
        await queryRunner.query(`DROP INDEX "public"."ix_checks_review_time"`);
        await queryRunner.query(`DROP INDEX "public"."ux_award_reminders"`);
        await queryRunner.query(`DROP TABLE "award_reminders"`);
        await queryRunner.query(`DROP INDEX "public"."ix_stand_down_alerts_unsent"`);
        await queryRunner.query(`DROP TABLE "stand_down_alerts"`);
        await queryRunner.query(`DROP INDEX "public"."ix_report_jobs_club"`);
        await queryRunner.query(`DROP TABLE "report_jobs"`);
        await queryRunner.query(`DROP INDEX "public"."ix_password_resets_user"`);
        await queryRunner.query(`DROP TABLE "password_resets"`);
        await queryRunner.query(`DROP INDEX "public"."ix_invites_club"`);
        await queryRunner.query(`DROP INDEX "public"."ix_invites_club_email"`);
        await queryRunner.query(`DROP TABLE "invites"`);
    }
}
//# sourceMappingURL=1796167688603-SupervisorDesk.js.map