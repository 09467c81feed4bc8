CREATE TYPE "public"."security_event_kind" AS ENUM('pin_failed', 'pin_locked', 'pin_unlocked', 'pin_set', 'wall_paired', 'wall_revoked', 'wall_pin_limit');--> statement-breakpoint
CREATE TYPE "public"."task_status" AS ENUM('todo', 'in_progress', 'done');--> statement-breakpoint
CREATE TYPE "public"."time_entry_source" AS ENUM('wall', 'web', 'correction');--> statement-breakpoint
CREATE TABLE "security_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"kind" "security_event_kind" NOT NULL,
	"membership_id" uuid,
	"device_id" uuid,
	"actor_user_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "task_assignees" (
	"task_id" uuid NOT NULL,
	"workshop_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	CONSTRAINT "task_assignees_task_id_user_id_pk" PRIMARY KEY("task_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "task_template_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"template_id" uuid NOT NULL,
	"title" text NOT NULL,
	"estimated_minutes" integer,
	"position" integer NOT NULL,
	CONSTRAINT "task_template_items_position" UNIQUE("template_id","position"),
	CONSTRAINT "task_template_items_title_not_blank" CHECK (length(trim("task_template_items"."title")) > 0),
	CONSTRAINT "task_template_items_estimate_range" CHECK ("task_template_items"."estimated_minutes" is null or "task_template_items"."estimated_minutes" between 0 and 30000),
	CONSTRAINT "task_template_items_position_non_negative" CHECK ("task_template_items"."position" >= 0)
);
--> statement-breakpoint
CREATE TABLE "task_templates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"stage_id" uuid NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "task_templates_stage" UNIQUE("stage_id"),
	CONSTRAINT "task_templates_id_workshop" UNIQUE("id","workshop_id")
);
--> statement-breakpoint
CREATE TABLE "tasks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"stage_id" uuid,
	"title" text NOT NULL,
	"status" "task_status" DEFAULT 'todo' NOT NULL,
	"estimated_minutes" integer,
	"position" integer NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "tasks_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "tasks_id_job_workshop" UNIQUE("id","job_id","workshop_id"),
	CONSTRAINT "tasks_title_not_blank" CHECK (length(trim("tasks"."title")) > 0),
	CONSTRAINT "tasks_estimate_range" CHECK ("tasks"."estimated_minutes" is null or "tasks"."estimated_minutes" between 0 and 30000),
	CONSTRAINT "tasks_position_non_negative" CHECK ("tasks"."position" >= 0),
	CONSTRAINT "tasks_version_positive" CHECK ("tasks"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "time_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"technician_id" uuid NOT NULL,
	"task_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"started_at" timestamp with time zone NOT NULL,
	"ended_at" timestamp with time zone,
	"source" time_entry_source NOT NULL,
	"created_by" uuid,
	"device_id" uuid,
	"needs_review" boolean DEFAULT false NOT NULL,
	"review_reason" text,
	"idempotency_key" text,
	"stop_idempotency_key" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "time_entries_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "time_entries_idempotency_key" UNIQUE("workshop_id","idempotency_key"),
	CONSTRAINT "time_entries_stop_idempotency_key" UNIQUE("workshop_id","stop_idempotency_key"),
	CONSTRAINT "time_entries_ends_after_start" CHECK ("time_entries"."ended_at" is null or "time_entries"."ended_at" > "time_entries"."started_at"),
	CONSTRAINT "time_entries_review_has_reason" CHECK (not "time_entries"."needs_review" or length(trim(coalesce("time_entries"."review_reason", ''))) > 0)
);
--> statement-breakpoint
CREATE TABLE "time_entry_corrections" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"entry_id" uuid NOT NULL,
	"reason" text NOT NULL,
	"by_user_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"old_started_at" timestamp with time zone NOT NULL,
	"old_ended_at" timestamp with time zone,
	"old_task_id" uuid NOT NULL,
	"new_started_at" timestamp with time zone NOT NULL,
	"new_ended_at" timestamp with time zone,
	"new_task_id" uuid NOT NULL,
	CONSTRAINT "time_entry_corrections_reason_not_blank" CHECK (length(trim("time_entry_corrections"."reason")) > 0)
);
--> statement-breakpoint
CREATE TABLE "timesheet_weeks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"technician_id" uuid NOT NULL,
	"week_start" date NOT NULL,
	"approved_by" uuid,
	"approved_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "timesheet_weeks_one_per_week" UNIQUE("workshop_id","technician_id","week_start"),
	CONSTRAINT "timesheet_weeks_starts_monday" CHECK (extract(isodow from "timesheet_weeks"."week_start") = 1)
);
--> statement-breakpoint
CREATE TABLE "wall_devices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"token_hash" text NOT NULL,
	"paired_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_seen_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"revoked_by" uuid,
	CONSTRAINT "wall_devices_tokenHash_unique" UNIQUE("token_hash"),
	CONSTRAINT "wall_devices_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "wall_devices_name_not_blank" CHECK (length(trim("wall_devices"."name")) > 0)
);
--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "bench_day_close" text DEFAULT '19:00' NOT NULL;--> statement-breakpoint
ALTER TABLE "memberships" ADD COLUMN "pin_hash" text;--> statement-breakpoint
ALTER TABLE "memberships" ADD COLUMN "pin_set_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "memberships" ADD COLUMN "pin_failed_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "memberships" ADD COLUMN "pin_locked_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_id_workshop" UNIQUE("id","workshop_id");--> statement-breakpoint
ALTER TABLE "security_events" ADD CONSTRAINT "security_events_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "security_events" ADD CONSTRAINT "security_events_actor_user_id_users_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "security_events" ADD CONSTRAINT "security_events_member_same_workshop" FOREIGN KEY ("membership_id","workshop_id") REFERENCES "public"."memberships"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "security_events" ADD CONSTRAINT "security_events_device_same_workshop" FOREIGN KEY ("device_id","workshop_id") REFERENCES "public"."wall_devices"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_assignees" ADD CONSTRAINT "task_assignees_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_assignees" ADD CONSTRAINT "task_assignees_task_same_workshop" FOREIGN KEY ("task_id","workshop_id") REFERENCES "public"."tasks"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_assignees" ADD CONSTRAINT "task_assignees_member_same_workshop" FOREIGN KEY ("workshop_id","user_id") REFERENCES "public"."memberships"("workshop_id","user_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_template_items" ADD CONSTRAINT "task_template_items_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_template_items" ADD CONSTRAINT "task_template_items_template_same_workshop" FOREIGN KEY ("template_id","workshop_id") REFERENCES "public"."task_templates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_templates" ADD CONSTRAINT "task_templates_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "task_templates" ADD CONSTRAINT "task_templates_stage_same_workshop" FOREIGN KEY ("stage_id","workshop_id") REFERENCES "public"."stages"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_stage_same_workshop" FOREIGN KEY ("stage_id","workshop_id") REFERENCES "public"."stages"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_technician_same_workshop" FOREIGN KEY ("workshop_id","technician_id") REFERENCES "public"."memberships"("workshop_id","user_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_task_same_job_and_workshop" FOREIGN KEY ("task_id","job_id","workshop_id") REFERENCES "public"."tasks"("id","job_id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_device_same_workshop" FOREIGN KEY ("device_id","workshop_id") REFERENCES "public"."wall_devices"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entry_corrections" ADD CONSTRAINT "time_entry_corrections_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entry_corrections" ADD CONSTRAINT "time_entry_corrections_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entry_corrections" ADD CONSTRAINT "time_entry_corrections_entry_same_workshop" FOREIGN KEY ("entry_id","workshop_id") REFERENCES "public"."time_entries"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entry_corrections" ADD CONSTRAINT "time_entry_corrections_old_task_same_workshop" FOREIGN KEY ("old_task_id","workshop_id") REFERENCES "public"."tasks"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "time_entry_corrections" ADD CONSTRAINT "time_entry_corrections_new_task_same_workshop" FOREIGN KEY ("new_task_id","workshop_id") REFERENCES "public"."tasks"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_weeks" ADD CONSTRAINT "timesheet_weeks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_weeks" ADD CONSTRAINT "timesheet_weeks_approved_by_users_id_fk" FOREIGN KEY ("approved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_weeks" ADD CONSTRAINT "timesheet_weeks_technician_same_workshop" FOREIGN KEY ("workshop_id","technician_id") REFERENCES "public"."memberships"("workshop_id","user_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wall_devices" ADD CONSTRAINT "wall_devices_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wall_devices" ADD CONSTRAINT "wall_devices_paired_by_users_id_fk" FOREIGN KEY ("paired_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wall_devices" ADD CONSTRAINT "wall_devices_revoked_by_users_id_fk" FOREIGN KEY ("revoked_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "security_events_device_id_kind_at_index" ON "security_events" USING btree ("device_id","kind","at");--> statement-breakpoint
CREATE INDEX "security_events_workshop_id_at_index" ON "security_events" USING btree ("workshop_id","at");--> statement-breakpoint
CREATE INDEX "task_assignees_workshop_id_user_id_index" ON "task_assignees" USING btree ("workshop_id","user_id");--> statement-breakpoint
CREATE INDEX "tasks_job_id_index" ON "tasks" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "tasks_workshop_id_status_index" ON "tasks" USING btree ("workshop_id","status");--> statement-breakpoint
CREATE UNIQUE INDEX "time_entries_one_running_per_technician" ON "time_entries" USING btree ("workshop_id","technician_id") WHERE "time_entries"."ended_at" is null;--> statement-breakpoint
CREATE INDEX "time_entries_workshop_id_technician_id_started_at_index" ON "time_entries" USING btree ("workshop_id","technician_id","started_at");--> statement-breakpoint
CREATE INDEX "time_entries_job_id_index" ON "time_entries" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "time_entries_task_id_index" ON "time_entries" USING btree ("task_id");--> statement-breakpoint
CREATE INDEX "time_entry_corrections_entry_id_at_index" ON "time_entry_corrections" USING btree ("entry_id","at");--> statement-breakpoint
CREATE INDEX "wall_devices_workshop_id_index" ON "wall_devices" USING btree ("workshop_id");--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_bench_day_close_hhmm" CHECK ("workshops"."bench_day_close" ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$');--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_pin_failed_count_non_negative" CHECK ("memberships"."pin_failed_count" >= 0);