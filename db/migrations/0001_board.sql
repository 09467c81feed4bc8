CREATE TYPE "public"."keytop_material" AS ENUM('ivory', 'plastic', 'other', 'unknown');--> statement-breakpoint
CREATE TYPE "public"."piano_type" AS ENUM('grand', 'upright', 'square', 'other');--> statement-breakpoint
CREATE TYPE "public"."job_priority" AS ENUM('low', 'normal', 'high', 'urgent');--> statement-breakpoint
CREATE TYPE "public"."job_status" AS ENUM('active', 'on_hold', 'done', 'cancelled');--> statement-breakpoint
CREATE TABLE "clients" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"email" text,
	"phone" text,
	"address" text,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "clients_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "clients_name_not_blank" CHECK (length(trim("clients"."name")) > 0)
);
--> statement-breakpoint
CREATE TABLE "pianos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"maker" text NOT NULL,
	"model" text DEFAULT '' NOT NULL,
	"serial_number" text DEFAULT '' NOT NULL,
	"type" "piano_type" NOT NULL,
	"size_mm" integer,
	"year_approx" integer,
	"case_finish" text DEFAULT '' NOT NULL,
	"keytop_material" "keytop_material" DEFAULT 'unknown' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "pianos_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "pianos_maker_not_blank" CHECK (length(trim("pianos"."maker")) > 0),
	CONSTRAINT "pianos_size_plausible" CHECK ("pianos"."size_mm" is null or ("pianos"."size_mm" > 0 and "pianos"."size_mm" <= 4000)),
	CONSTRAINT "pianos_year_plausible" CHECK ("pianos"."year_approx" is null or ("pianos"."year_approx" between 1700 and 2100))
);
--> statement-breakpoint
CREATE TABLE "job_stage_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"from_stage_id" uuid,
	"to_stage_id" uuid NOT NULL,
	"by_user_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"piano_id" uuid NOT NULL,
	"stage_id" uuid NOT NULL,
	"position" integer,
	"title" text NOT NULL,
	"status" "job_status" DEFAULT 'active' NOT NULL,
	"priority" "job_priority" DEFAULT 'normal' NOT NULL,
	"promised_on" date,
	"is_blocked" boolean DEFAULT false NOT NULL,
	"blocked_reason" text,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "jobs_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "jobs_title_not_blank" CHECK (length(trim("jobs"."title")) > 0),
	CONSTRAINT "jobs_position_when_on_board" CHECK (("jobs"."status" in ('active', 'on_hold')) = ("jobs"."position" is not null)),
	CONSTRAINT "jobs_position_non_negative" CHECK ("jobs"."position" is null or "jobs"."position" >= 0),
	CONSTRAINT "jobs_blocked_has_reason" CHECK (not "jobs"."is_blocked" or length(trim(coalesce("jobs"."blocked_reason", ''))) > 0),
	CONSTRAINT "jobs_version_positive" CHECK ("jobs"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "stages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"position" integer NOT NULL,
	"wip_limit" integer,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stages_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "stages_name_not_blank" CHECK (length(trim("stages"."name")) > 0),
	CONSTRAINT "stages_position_non_negative" CHECK ("stages"."position" >= 0),
	CONSTRAINT "stages_wip_limit_positive" CHECK ("stages"."wip_limit" is null or "stages"."wip_limit" > 0)
);
--> statement-breakpoint
ALTER TABLE "clients" ADD CONSTRAINT "clients_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pianos" ADD CONSTRAINT "pianos_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pianos" ADD CONSTRAINT "pianos_client_same_workshop" FOREIGN KEY ("client_id","workshop_id") REFERENCES "public"."clients"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_stage_events" ADD CONSTRAINT "job_stage_events_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_stage_events" ADD CONSTRAINT "job_stage_events_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_stage_events" ADD CONSTRAINT "job_stage_events_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_stage_events" ADD CONSTRAINT "job_stage_events_from_same_workshop" FOREIGN KEY ("from_stage_id","workshop_id") REFERENCES "public"."stages"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_stage_events" ADD CONSTRAINT "job_stage_events_to_same_workshop" FOREIGN KEY ("to_stage_id","workshop_id") REFERENCES "public"."stages"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_client_same_workshop" FOREIGN KEY ("client_id","workshop_id") REFERENCES "public"."clients"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_piano_same_workshop" FOREIGN KEY ("piano_id","workshop_id") REFERENCES "public"."pianos"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_stage_same_workshop" FOREIGN KEY ("stage_id","workshop_id") REFERENCES "public"."stages"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stages" ADD CONSTRAINT "stages_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "clients_workshop_name" ON "clients" USING btree ("workshop_id",lower("name"));--> statement-breakpoint
CREATE INDEX "pianos_workshop_id_client_id_index" ON "pianos" USING btree ("workshop_id","client_id");--> statement-breakpoint
CREATE INDEX "job_stage_events_job_id_at_index" ON "job_stage_events" USING btree ("job_id","at");--> statement-breakpoint
CREATE INDEX "jobs_workshop_id_status_index" ON "jobs" USING btree ("workshop_id","status");--> statement-breakpoint
CREATE INDEX "jobs_piano_id_index" ON "jobs" USING btree ("piano_id");