CREATE TABLE "captured_mail" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"recipients" text[] NOT NULL,
	"sender" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "activity" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" text NOT NULL,
	"mission_id" uuid,
	"actor_id" text NOT NULL,
	"actor_name" text NOT NULL,
	"action" text NOT NULL,
	"entity" text NOT NULL,
	"summary" text NOT NULL,
	"revision_before" integer,
	"revision_after" integer,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "chains" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"key" text NOT NULL,
	"position" integer NOT NULL,
	"laser_id" uuid NOT NULL,
	"resonator_id" uuid NOT NULL,
	"detector_id" uuid NOT NULL,
	"mode" integer NOT NULL,
	"sideband" text NOT NULL,
	"lo_offset_ghz" double precision NOT NULL,
	"rf_input_min_ghz" double precision NOT NULL,
	"rf_input_max_ghz" double precision NOT NULL,
	"tap_fraction" double precision NOT NULL,
	"path_loss_db" double precision NOT NULL,
	"carrier_rejection_db" double precision DEFAULT 0 NOT NULL,
	"shared_if" boolean DEFAULT false NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "channels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"key" text NOT NULL,
	"position" integer NOT NULL,
	"chain_id" uuid NOT NULL,
	"name" text NOT NULL,
	"center_ghz" double precision NOT NULL,
	"bandwidth_mhz" double precision NOT NULL,
	"dsb_offset_ghz" double precision,
	"integration_ms" double precision NOT NULL,
	"antenna_k" double precision NOT NULL,
	"receiver_k" double precision NOT NULL,
	"gain_stability" double precision DEFAULT 0 NOT NULL,
	"required_nedt_k" double precision,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "detectors" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"key" text NOT NULL,
	"position" integer NOT NULL,
	"min_ghz" double precision NOT NULL,
	"max_ghz" double precision NOT NULL,
	"max_input_mw" double precision NOT NULL,
	"sample_rate_ghz" double precision,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "findings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"mission_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"code" text NOT NULL,
	"severity" text NOT NULL,
	"chain_key" text NOT NULL,
	"channel_key" text,
	"message" text NOT NULL,
	"data" jsonb DEFAULT '{}'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lasers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"key" text NOT NULL,
	"position" integer NOT NULL,
	"carrier_thz" double precision NOT NULL,
	"carrier_power_mw" double precision NOT NULL,
	"lo_power_mw" double precision NOT NULL,
	"reach" jsonb NOT NULL,
	"step_mhz" double precision NOT NULL,
	"drift_mhz" double precision NOT NULL,
	"lock_modulation_mhz" double precision NOT NULL,
	"lock_modulation_index" double precision NOT NULL,
	"lock_orders" integer NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "missions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" text NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"created_by" text NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"plan" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"author_id" text NOT NULL,
	"author_name" text NOT NULL,
	"summary" text NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"error_count" integer NOT NULL,
	"warning_count" integer NOT NULL,
	"info_count" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_settings" (
	"mission_id" uuid PRIMARY KEY NOT NULL,
	"guard_mhz" double precision NOT NULL,
	"image_rejection_db" double precision NOT NULL,
	"spur_max_order" integer NOT NULL,
	"replica_limit_db" double precision NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "resonators" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"key" text NOT NULL,
	"position" integer NOT NULL,
	"fsr_ghz" double precision NOT NULL,
	"loaded_q" double precision NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"filename" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"sha256" text NOT NULL,
	"content" "bytea" NOT NULL,
	"uploaded_by" text NOT NULL,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "activity" ADD CONSTRAINT "activity_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "chains" ADD CONSTRAINT "chains_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "chains" ADD CONSTRAINT "chains_laser_id_lasers_id_fk" FOREIGN KEY ("laser_id") REFERENCES "public"."lasers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "chains" ADD CONSTRAINT "chains_resonator_id_resonators_id_fk" FOREIGN KEY ("resonator_id") REFERENCES "public"."resonators"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "chains" ADD CONSTRAINT "chains_detector_id_detectors_id_fk" FOREIGN KEY ("detector_id") REFERENCES "public"."detectors"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "channels" ADD CONSTRAINT "channels_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "channels" ADD CONSTRAINT "channels_chain_id_chains_id_fk" FOREIGN KEY ("chain_id") REFERENCES "public"."chains"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "detectors" ADD CONSTRAINT "detectors_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_revision_id_plan_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."plan_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lasers" ADD CONSTRAINT "lasers_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_revisions" ADD CONSTRAINT "plan_revisions_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_settings" ADD CONSTRAINT "plan_settings_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "resonators" ADD CONSTRAINT "resonators_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "activity_mission_at_idx" ON "activity" USING btree ("mission_id","at");--> statement-breakpoint
CREATE INDEX "activity_team_at_idx" ON "activity" USING btree ("team_id","at");--> statement-breakpoint
CREATE UNIQUE INDEX "chains_mission_key_uq" ON "chains" USING btree ("mission_id","key");--> statement-breakpoint
CREATE UNIQUE INDEX "channels_mission_key_uq" ON "channels" USING btree ("mission_id","key");--> statement-breakpoint
CREATE INDEX "channels_chain_idx" ON "channels" USING btree ("chain_id");--> statement-breakpoint
CREATE UNIQUE INDEX "detectors_mission_key_uq" ON "detectors" USING btree ("mission_id","key");--> statement-breakpoint
CREATE INDEX "findings_revision_idx" ON "findings" USING btree ("revision_id","position");--> statement-breakpoint
CREATE INDEX "findings_revision_severity_idx" ON "findings" USING btree ("revision_id","severity");--> statement-breakpoint
CREATE INDEX "findings_revision_code_idx" ON "findings" USING btree ("revision_id","code");--> statement-breakpoint
CREATE INDEX "findings_revision_chain_idx" ON "findings" USING btree ("revision_id","chain_key");--> statement-breakpoint
CREATE INDEX "findings_revision_channel_idx" ON "findings" USING btree ("revision_id","channel_key");--> statement-breakpoint
CREATE UNIQUE INDEX "lasers_mission_key_uq" ON "lasers" USING btree ("mission_id","key");--> statement-breakpoint
CREATE INDEX "missions_team_idx" ON "missions" USING btree ("team_id");--> statement-breakpoint
CREATE UNIQUE INDEX "plan_revisions_mission_number_uq" ON "plan_revisions" USING btree ("mission_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "resonators_mission_key_uq" ON "resonators" USING btree ("mission_id","key");--> statement-breakpoint
CREATE INDEX "uploads_mission_idx" ON "uploads" USING btree ("mission_id");