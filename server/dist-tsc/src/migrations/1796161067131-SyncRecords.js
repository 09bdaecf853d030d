export class SyncRecords1796161067131 {
    name = 'SyncRecords1796161067131';
    async up(queryRunner) {
        await queryRunner.query(`CREATE TABLE "sync_changes" ("club_id" uuid NOT NULL, "seq" bigint NOT NULL, "kind" text NOT NULL, "record_id" uuid NOT NULL, "version" integer NOT NULL, "mutation_id" uuid, "device_id" text NOT NULL, "user_id" uuid NOT NULL, "hlc" text NOT NULL, "patch" jsonb NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "status" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_6c1247e4d16265cb2b8689816db" PRIMARY KEY ("club_id", "seq"))`);
        await queryRunner.query(`CREATE INDEX "ix_sync_changes_record" ON "sync_changes"  ("record_id", "version") `);
        await queryRunner.query(`CREATE TABLE "sync_club_state" ("club_id" uuid NOT NULL, "last_seq" bigint NOT NULL DEFAULT '0', "purged_through_seq" bigint NOT NULL DEFAULT '0', CONSTRAINT "PK_9990b08bd89f196790c2b268528" PRIMARY KEY ("club_id"))`);
        await queryRunner.query(`CREATE TABLE "sync_devices" ("club_id" uuid NOT NULL, "device_id" text NOT NULL, "last_seq" integer NOT NULL DEFAULT '0', "last_user_id" uuid, "last_push_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_b52ef5ced399220a5120aefb816" PRIMARY KEY ("club_id", "device_id"))`);
        await queryRunner.query(`CREATE TABLE "sync_conflicts" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "record_id" uuid NOT NULL, "kind" text NOT NULL, "field" text NOT NULL, "kept_value" jsonb, "overruled_value" jsonb, "kept" jsonb NOT NULL, "overruled" jsonb NOT NULL, "status" text NOT NULL DEFAULT 'open', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "settled_by" uuid, "settled_at" TIMESTAMP WITH TIME ZONE, "settled_value" jsonb, "note" text, CONSTRAINT "PK_351e71cb6c48c898e6cb7fb5347" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_sync_conflicts_open" ON "sync_conflicts"  ("club_id", "status", "created_at") `);
        await queryRunner.query(`CREATE TABLE "boats" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "fleet_number" text, "name" text, "hull_serial" text, "air_chambers" jsonb, "required_gear" jsonb, "notes" text, "in_service" boolean, CONSTRAINT "PK_7f192e10b468d99557a0aede7e5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_boats_changes" ON "boats"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "motors" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "serial" text, "model" text, "power_hp" double precision, "hour_meter" double precision, "service_interval_hours" double precision, "service_interval_months" double precision, "last_service_at" text, "last_service_hours" double precision, "fuel_mode" text, "premix_ratio" double precision, "boat_id" text, CONSTRAINT "PK_269e92e765c285e15b38f9ca058" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_motors_changes" ON "motors"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "motor_moves" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "motor_id" text, "from_boat_id" text, "to_boat_id" text, "moved_at" text, "reason" text, CONSTRAINT "PK_057d47e318fe8cfc609f51fca85" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_motor_moves_changes" ON "motor_moves"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "check_templates" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "check_type" text, "name" text, "template_version" double precision, "sections" jsonb, "retired" boolean, CONSTRAINT "PK_5105b820800c5e905104a7fb425" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_check_templates_changes" ON "check_templates"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "checks" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "boat_id" text, "motor_id" text, "check_type" text, "template_id" text, "template_version" double precision, "started_at" text, "completed_at" text, "status" text, "results" jsonb, "performed_by" text, "signed_off_by" text, "signed_off_at" text, CONSTRAINT "PK_5b78bc7432d3654a701ca5f35e5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_checks_changes" ON "checks"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "defects" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "boat_id" text, "motor_id" text, "check_id" text, "item_id" text, "severity" text, "description" text, "photos" jsonb, "status" text, "reported_by" text, "reported_at" text, "assigned_to" text, "action_taken" text, "repaired_at" text, "verified_by" text, "verified_at" text, "rejected_reason" text, "notes" jsonb, CONSTRAINT "PK_b4bca3e4d032e3b50d1889ad296" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_defects_changes" ON "defects"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "sign_ons" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "boat_id" text, "member_id" text, "role" text, "session_date" text, "signed_on_at" text, "signed_off_at" text, CONSTRAINT "PK_69b4ebd428ab1d9d40f271dd011" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_sign_ons_changes" ON "sign_ons"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "trips" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "boat_id" text, "motor_id" text, "purpose" text, "driver_id" text, "crew_ids" jsonb, "launched_at" text, "retrieved_at" text, "wind_speed_kn" double precision, "wind_direction_deg" double precision, "wave_height_m" double precision, "engine_hours_start" double precision, "engine_hours_end" double precision, "fuel_added_l" double precision, "notes" jsonb, "edit_reasons" jsonb, CONSTRAINT "PK_f71c231dee9c05a9522f9e840f5" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_trips_changes" ON "trips"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "incident_notes" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "trip_id" text, "boat_id" text, "kind" text, "occurred_at" text, "lat" double precision, "lon" double precision, "people_helped" double precision, "action_taken" text, "outcome" text, "text" text, "author_id" text, CONSTRAINT "PK_213673177d807c19f3081e18b2e" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_incident_notes_changes" ON "incident_notes"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "service_records" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "motor_id" text, "serviced_at" text, "engine_hours" double precision, "work" text, "performed_by" text, CONSTRAINT "PK_eb60ec90c5548e73a5211c48ab9" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_service_records_changes" ON "service_records"  ("club_id", "change_seq") `);
        await queryRunner.query(`CREATE TABLE "day_sign_offs" ("id" uuid NOT NULL, "club_id" uuid NOT NULL, "version" integer NOT NULL, "hlc" text NOT NULL, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL, "updated_by" uuid NOT NULL, "updated_role" text, "device_id" text NOT NULL, "deleted" boolean NOT NULL DEFAULT false, "change_seq" bigint NOT NULL, "field_stamps" jsonb NOT NULL DEFAULT '{}', "session_date" text, "boat_id" text, "signed_off_by" text, "signed_off_at" text, "note" text, CONSTRAINT "PK_1c93a0ba9ab3dd94fcc696d1c3c" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "ix_day_sign_offs_changes" ON "day_sign_offs"  ("club_id", "change_seq") `);
    }
    async down(queryRunner) {
        await queryRunner.query(`DROP INDEX "public"."ix_day_sign_offs_changes"`);
        await queryRunner.query(`DROP TABLE "day_sign_offs"`);
        await queryRunner.query(`DROP INDEX "public"."ix_service_records_changes"`);
        await queryRunner.query(`DROP TABLE "service_records"`);
        await queryRunner.query(`DROP INDEX "public"."ix_incident_notes_changes"`);
        await queryRunner.query(`DROP TABLE "incident_notes"`);
        await queryRunner.query(`DROP INDEX "public"."ix_trips_changes"`);
        await queryRunner.query(`DROP TABLE "trips"`);
        await queryRunner.query(`DROP INDEX "public"."ix_sign_ons_changes"`);
        await queryRunner.query(`DROP TABLE "sign_ons"`);
        await queryRunner.query(`DROP INDEX "public"."ix_defects_changes"`);
        await queryRunner.query(`DROP TABLE "defects"`);
        await queryRunner.query(`DROP INDEX "public"."ix_checks_changes"`);
        await queryRunner.query(`DROP TABLE "checks"`);
        await queryRunner.query(`DROP INDEX "public"."ix_check_templates_changes"`);
        await queryRunner.query(`DROP TABLE "check_templates"`);
        await queryRunner.query(`DROP INDEX "public"."ix_motor_moves_changes"`);
        await queryRunner.query(`DROP TABLE "motor_moves"`);
        await queryRunner.query(`DROP INDEX "public"."ix_motors_changes"`);
        await queryRunner.query(`DROP TABLE "motors"`);
        await queryRunner.query(`DROP INDEX "public"."ix_boats_changes"`);
        await queryRunner.query(`DROP TABLE "boats"`);
        await queryRunner.query(`DROP INDEX "public"."ix_sync_conflicts_open"`);
        await queryRunner.query(`DROP TABLE "sync_conflicts"`);
        await queryRunner.query(`DROP TABLE "sync_devices"`);
        await queryRunner.query(`DROP TABLE "sync_club_state"`);
        await queryRunner.query(`DROP INDEX "public"."ix_sync_changes_record"`);
        await queryRunner.query(`DROP TABLE "sync_changes"`);
    }
}
//# sourceMappingURL=1796161067131-SyncRecords.js.map