CREATE TABLE "notification_preferences" (
	"user_id" text PRIMARY KEY NOT NULL,
	"review_requested" boolean DEFAULT true NOT NULL,
	"review_decided" boolean DEFAULT true NOT NULL,
	"mentioned" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "review_comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"revision_number" integer NOT NULL,
	"channel_key" text,
	"finding_id" uuid,
	"author_id" text NOT NULL,
	"author_name" text NOT NULL,
	"body" text NOT NULL,
	"mentions" text[] DEFAULT '{}' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reviews" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"revision_number" integer NOT NULL,
	"submitted_by" text NOT NULL,
	"submitted_by_name" text NOT NULL,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"outcome" text DEFAULT 'open' NOT NULL,
	"decided_by" text,
	"decided_by_name" text,
	"decided_at" timestamp with time zone,
	"decision_note" text,
	"waivers_at_decision" jsonb
);
--> statement-breakpoint
CREATE TABLE "waivers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"mission_id" uuid NOT NULL,
	"finding_key" text NOT NULL,
	"code" text NOT NULL,
	"chain_key" text NOT NULL,
	"channel_key" text,
	"revision_number" integer NOT NULL,
	"finding_message" text NOT NULL,
	"reason" text NOT NULL,
	"waived_by" text NOT NULL,
	"waived_by_name" text NOT NULL,
	"waived_at" timestamp with time zone DEFAULT now() NOT NULL,
	"withdrawn_by" text,
	"withdrawn_by_name" text,
	"withdrawn_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
ALTER TABLE "review_comments" ADD CONSTRAINT "review_comments_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_comments" ADD CONSTRAINT "review_comments_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reviews" ADD CONSTRAINT "reviews_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reviews" ADD CONSTRAINT "reviews_revision_id_plan_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."plan_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "waivers" ADD CONSTRAINT "waivers_mission_id_missions_id_fk" FOREIGN KEY ("mission_id") REFERENCES "public"."missions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "review_comments_mission_idx" ON "review_comments" USING btree ("mission_id","created_at");--> statement-breakpoint
CREATE INDEX "reviews_mission_idx" ON "reviews" USING btree ("mission_id","submitted_at");--> statement-breakpoint
CREATE INDEX "reviews_revision_idx" ON "reviews" USING btree ("revision_id");--> statement-breakpoint
CREATE INDEX "waivers_mission_key_idx" ON "waivers" USING btree ("mission_id","finding_key");