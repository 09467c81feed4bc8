CREATE TYPE "public"."survey_grade" AS ENUM('sound', 'serviceable', 'needs_work', 'replace');--> statement-breakpoint
CREATE TYPE "public"."survey_measure" AS ENUM('a4_pitch', 'tuning_pin_torque');--> statement-breakpoint
CREATE TYPE "public"."survey_piano_type" AS ENUM('grand', 'upright');--> statement-breakpoint
CREATE TYPE "public"."catalogue_line_kind" AS ENUM('labour', 'part', 'sublet');--> statement-breakpoint
CREATE TYPE "public"."client_answer" AS ENUM('accepted', 'declined');--> statement-breakpoint
CREATE TYPE "public"."payment_kind" AS ENUM('deposit');--> statement-breakpoint
CREATE TYPE "public"."payment_status" AS ENUM('pending', 'paid');--> statement-breakpoint
ALTER TYPE "public"."job_status" ADD VALUE 'proposed';--> statement-breakpoint
CREATE TABLE "survey_components" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"survey_id" uuid NOT NULL,
	"key" text NOT NULL,
	"area" text NOT NULL,
	"name" text NOT NULL,
	"hint" text DEFAULT '' NOT NULL,
	"measure" "survey_measure",
	"position" integer NOT NULL,
	"grade" "survey_grade",
	"not_inspected_reason" text,
	"note" text DEFAULT '' NOT NULL,
	"a4_pitch_centi_hz" integer,
	"tuning_pin_torque_deci_nm" integer,
	"version" integer DEFAULT 1 NOT NULL,
	"updated_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "survey_components_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "survey_components_key" UNIQUE("survey_id","key"),
	CONSTRAINT "survey_components_position" UNIQUE("survey_id","position"),
	CONSTRAINT "survey_components_graded_or_not_inspected" CHECK ("survey_components"."grade" is null or "survey_components"."not_inspected_reason" is null),
	CONSTRAINT "survey_components_reason_not_blank" CHECK ("survey_components"."not_inspected_reason" is null or length(trim("survey_components"."not_inspected_reason")) > 0),
	CONSTRAINT "survey_components_pitch_measured_here" CHECK ("survey_components"."a4_pitch_centi_hz" is null or ("survey_components"."measure" = 'a4_pitch' and "survey_components"."a4_pitch_centi_hz" between 30000 and 50000)),
	CONSTRAINT "survey_components_torque_measured_here" CHECK ("survey_components"."tuning_pin_torque_deci_nm" is null or ("survey_components"."measure" = 'tuning_pin_torque' and "survey_components"."tuning_pin_torque_deci_nm" between 0 and 400)),
	CONSTRAINT "survey_components_position_non_negative" CHECK ("survey_components"."position" >= 0),
	CONSTRAINT "survey_components_version_positive" CHECK ("survey_components"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "survey_templates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"piano_type" "survey_piano_type" NOT NULL,
	"items" jsonb NOT NULL,
	"updated_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "survey_templates_one_per_type" UNIQUE("workshop_id","piano_type"),
	CONSTRAINT "survey_templates_items_list" CHECK (jsonb_typeof("survey_templates"."items") = 'array' and jsonb_array_length("survey_templates"."items") between 1 and 120)
);
--> statement-breakpoint
CREATE TABLE "surveys" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"piano_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"surveyed_on" date NOT NULL,
	"place" text DEFAULT '' NOT NULL,
	"assessor_id" uuid,
	"piano_type" "survey_piano_type" NOT NULL,
	"serial_number" text DEFAULT '' NOT NULL,
	"is_serial_confirmed" boolean DEFAULT false NOT NULL,
	"size_mm" integer,
	"keytop_material" "keytop_material" DEFAULT 'unknown' NOT NULL,
	"overall_grade" "survey_grade",
	"overall_condition" text DEFAULT '' NOT NULL,
	"recommended_work" text DEFAULT '' NOT NULL,
	"choices" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"finished_at" timestamp with time zone,
	"job_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "surveys_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "surveys_size_plausible" CHECK ("surveys"."size_mm" is null or ("surveys"."size_mm" > 0 and "surveys"."size_mm" <= 4000)),
	CONSTRAINT "surveys_choices_list" CHECK (jsonb_typeof("surveys"."choices") = 'array'),
	CONSTRAINT "surveys_version_positive" CHECK ("surveys"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"storage_key" text NOT NULL,
	"thumb_key" text NOT NULL,
	"source_type" text NOT NULL,
	"original_name" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"byte_size" integer NOT NULL,
	"survey_component_id" uuid,
	"job_id" uuid,
	"task_id" uuid,
	"is_shared_with_client" boolean DEFAULT false NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "uploads_storageKey_unique" UNIQUE("storage_key"),
	CONSTRAINT "uploads_thumbKey_unique" UNIQUE("thumb_key"),
	CONSTRAINT "uploads_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "uploads_one_owner" CHECK (num_nonnulls("uploads"."survey_component_id", "uploads"."job_id", "uploads"."task_id") = 1),
	CONSTRAINT "uploads_source_type" CHECK ("uploads"."source_type" in ('image/jpeg', 'image/png', 'image/webp')),
	CONSTRAINT "uploads_dimensions_positive" CHECK ("uploads"."width" > 0 and "uploads"."height" > 0 and "uploads"."byte_size" > 0),
	CONSTRAINT "uploads_name_plain" CHECK ("uploads"."original_name" !~ '[/\\]' and length("uploads"."original_name") between 1 and 255)
);
--> statement-breakpoint
CREATE TABLE "catalogue_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"operation_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"kind" "catalogue_line_kind" NOT NULL,
	"description" text NOT NULL,
	"minutes" integer,
	"part_id" uuid,
	"quantity_milli" bigint,
	"unit_price_minor" bigint,
	"unit_cost_minor" bigint,
	"supplier" text,
	CONSTRAINT "catalogue_lines_position" UNIQUE("operation_id","position"),
	CONSTRAINT "catalogue_lines_description_not_blank" CHECK (length(trim("catalogue_lines"."description")) > 0),
	CONSTRAINT "catalogue_lines_position_non_negative" CHECK ("catalogue_lines"."position" >= 0),
	CONSTRAINT "catalogue_lines_kind_rules" CHECK (case "catalogue_lines"."kind"
        when 'labour' then "catalogue_lines"."minutes" between 1 and 30000 and "catalogue_lines"."part_id" is null and "catalogue_lines"."quantity_milli" is null and "catalogue_lines"."unit_price_minor" is null and "catalogue_lines"."unit_cost_minor" is null
        when 'part' then "catalogue_lines"."part_id" is not null and "catalogue_lines"."quantity_milli" > 0 and "catalogue_lines"."minutes" is null and "catalogue_lines"."unit_price_minor" is null and "catalogue_lines"."unit_cost_minor" is null
        else "catalogue_lines"."quantity_milli" > 0 and "catalogue_lines"."unit_price_minor" >= 0 and coalesce("catalogue_lines"."unit_cost_minor", 0) >= 0 and "catalogue_lines"."minutes" is null and "catalogue_lines"."part_id" is null
      end)
);
--> statement-breakpoint
CREATE TABLE "catalogue_operations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"piano_type" "survey_piano_type",
	"component_keys" text[] DEFAULT '{}'::text[] NOT NULL,
	"is_active" boolean DEFAULT true NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "catalogue_operations_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "catalogue_operations_name_not_blank" CHECK (length(trim("catalogue_operations"."name")) > 0),
	CONSTRAINT "catalogue_operations_version_positive" CHECK ("catalogue_operations"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "client_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"estimate_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"sent_to" text NOT NULL,
	"sent_by" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"last_opened_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "client_links_tokenHash_unique" UNIQUE("token_hash"),
	CONSTRAINT "client_links_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "client_links_expiry_after_creation" CHECK ("client_links"."expires_at" > "client_links"."created_at")
);
--> statement-breakpoint
CREATE TABLE "client_responses" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"link_id" uuid NOT NULL,
	"estimate_id" uuid NOT NULL,
	"answer" "client_answer" NOT NULL,
	"revision" integer NOT NULL,
	"estimate_version" integer NOT NULL,
	"option_ids" uuid[] DEFAULT '{}'::uuid[] NOT NULL,
	"name" text,
	"reason" text,
	"ip_address" text NOT NULL,
	"at" timestamp with time zone NOT NULL,
	CONSTRAINT "client_responses_one_per_estimate" UNIQUE("estimate_id"),
	CONSTRAINT "client_responses_accepted_has_name" CHECK ("client_responses"."answer" <> 'accepted' or length(trim(coalesce("client_responses"."name", ''))) > 0),
	CONSTRAINT "client_responses_revision_positive" CHECK ("client_responses"."revision" >= 1)
);
--> statement-breakpoint
CREATE TABLE "client_terms" (
	"workshop_id" uuid PRIMARY KEY NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"vat_number" text DEFAULT '' NOT NULL,
	"terms" text DEFAULT '' NOT NULL,
	"deposit_basis_points" integer DEFAULT 3000 NOT NULL,
	"link_lifetime_days" integer DEFAULT 30 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "client_terms_deposit_range" CHECK ("client_terms"."deposit_basis_points" between 0 and 10000),
	CONSTRAINT "client_terms_link_lifetime_range" CHECK ("client_terms"."link_lifetime_days" between 1 and 365)
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"payment_id" uuid,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"estimate_id" uuid NOT NULL,
	"kind" "payment_kind" NOT NULL,
	"status" "payment_status" DEFAULT 'pending' NOT NULL,
	"amount_minor" bigint NOT NULL,
	"currency" text NOT NULL,
	"checkout_session_id" text,
	"checkout_url" text,
	"provider_reference" text,
	"paid_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "payments_amount_positive" CHECK ("payments"."amount_minor" > 0),
	CONSTRAINT "payments_currency_iso4217" CHECK ("payments"."currency" ~ '^[A-Z]{3}$'),
	CONSTRAINT "payments_paid_has_time" CHECK (("payments"."status" = 'paid') = ("payments"."paid_at" is not null))
);
--> statement-breakpoint
ALTER TABLE "survey_components" ADD CONSTRAINT "survey_components_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_components" ADD CONSTRAINT "survey_components_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_components" ADD CONSTRAINT "survey_components_survey_same_workshop" FOREIGN KEY ("survey_id","workshop_id") REFERENCES "public"."surveys"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_templates" ADD CONSTRAINT "survey_templates_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "survey_templates" ADD CONSTRAINT "survey_templates_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_assessor_id_users_id_fk" FOREIGN KEY ("assessor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_piano_same_workshop" FOREIGN KEY ("piano_id","workshop_id") REFERENCES "public"."pianos"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_client_same_workshop" FOREIGN KEY ("client_id","workshop_id") REFERENCES "public"."clients"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surveys" ADD CONSTRAINT "surveys_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_component_same_workshop" FOREIGN KEY ("survey_component_id","workshop_id") REFERENCES "public"."survey_components"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_task_same_workshop" FOREIGN KEY ("task_id","workshop_id") REFERENCES "public"."tasks"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_lines" ADD CONSTRAINT "catalogue_lines_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_lines" ADD CONSTRAINT "catalogue_lines_operation_same_workshop" FOREIGN KEY ("operation_id","workshop_id") REFERENCES "public"."catalogue_operations"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_lines" ADD CONSTRAINT "catalogue_lines_part_same_workshop" FOREIGN KEY ("part_id","workshop_id") REFERENCES "public"."parts"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_operations" ADD CONSTRAINT "catalogue_operations_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_links" ADD CONSTRAINT "client_links_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_links" ADD CONSTRAINT "client_links_sent_by_users_id_fk" FOREIGN KEY ("sent_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_links" ADD CONSTRAINT "client_links_estimate_same_workshop" FOREIGN KEY ("estimate_id","workshop_id") REFERENCES "public"."estimates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_responses" ADD CONSTRAINT "client_responses_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_responses" ADD CONSTRAINT "client_responses_link_same_workshop" FOREIGN KEY ("link_id","workshop_id") REFERENCES "public"."client_links"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_responses" ADD CONSTRAINT "client_responses_estimate_same_workshop" FOREIGN KEY ("estimate_id","workshop_id") REFERENCES "public"."estimates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_terms" ADD CONSTRAINT "client_terms_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_events" ADD CONSTRAINT "payment_events_payment_id_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."payments"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_estimate_same_workshop" FOREIGN KEY ("estimate_id","workshop_id") REFERENCES "public"."estimates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "surveys_workshop_id_piano_id_index" ON "surveys" USING btree ("workshop_id","piano_id");--> statement-breakpoint
CREATE INDEX "uploads_survey_component_id_index" ON "uploads" USING btree ("survey_component_id");--> statement-breakpoint
CREATE INDEX "uploads_job_id_index" ON "uploads" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "uploads_task_id_index" ON "uploads" USING btree ("task_id");--> statement-breakpoint
CREATE INDEX "catalogue_lines_operation_id_index" ON "catalogue_lines" USING btree ("operation_id");--> statement-breakpoint
CREATE INDEX "catalogue_operations_name_per_workshop" ON "catalogue_operations" USING btree ("workshop_id",lower("name"));--> statement-breakpoint
CREATE INDEX "client_links_estimate_id_index" ON "client_links" USING btree ("estimate_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payments_checkout_session" ON "payments" USING btree ("checkout_session_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payments_one_deposit_per_estimate" ON "payments" USING btree ("estimate_id") WHERE "payments"."kind" = 'deposit';--> statement-breakpoint
CREATE INDEX "payments_job_id_index" ON "payments" USING btree ("job_id");