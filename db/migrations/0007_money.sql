CREATE TYPE "public"."stock_movement_kind" AS ENUM('received', 'used', 'returned', 'adjusted');--> statement-breakpoint
CREATE TYPE "public"."estimate_kind" AS ENUM('original', 'variation');--> statement-breakpoint
CREATE TYPE "public"."estimate_line_kind" AS ENUM('labour', 'part', 'sublet', 'other');--> statement-breakpoint
CREATE TYPE "public"."estimate_status" AS ENUM('draft', 'issued', 'accepted', 'declined', 'superseded');--> statement-breakpoint
CREATE TABLE "sublet_bills" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"supplier" text NOT NULL,
	"description" text NOT NULL,
	"cost_minor" bigint NOT NULL,
	"received_on" date NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sublet_bills_cost_positive" CHECK ("sublet_bills"."cost_minor" > 0),
	CONSTRAINT "sublet_bills_supplier_not_blank" CHECK (length(trim("sublet_bills"."supplier")) > 0),
	CONSTRAINT "sublet_bills_description_not_blank" CHECK (length(trim("sublet_bills"."description")) > 0)
);
--> statement-breakpoint
CREATE TABLE "technician_cost_rates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"effective_from" date NOT NULL,
	"rate_minor_per_hour" integer NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "technician_cost_rates_one_per_day" UNIQUE("workshop_id","user_id","effective_from"),
	CONSTRAINT "technician_cost_rates_positive" CHECK ("technician_cost_rates"."rate_minor_per_hour" > 0)
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"sku" text NOT NULL,
	"name" text NOT NULL,
	"unit" text NOT NULL,
	"supplier" text DEFAULT '' NOT NULL,
	"unit_cost_minor" bigint NOT NULL,
	"sell_price_minor" bigint,
	"markup_basis_points" integer,
	"reorder_level_milli" bigint DEFAULT 0 NOT NULL,
	"is_active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "parts_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "parts_sku_not_blank" CHECK (length(trim("parts"."sku")) > 0),
	CONSTRAINT "parts_name_not_blank" CHECK (length(trim("parts"."name")) > 0),
	CONSTRAINT "parts_unit_not_blank" CHECK (length(trim("parts"."unit")) > 0),
	CONSTRAINT "parts_unit_cost_non_negative" CHECK ("parts"."unit_cost_minor" >= 0),
	CONSTRAINT "parts_one_price_rule" CHECK (("parts"."sell_price_minor" is null) <> ("parts"."markup_basis_points" is null)),
	CONSTRAINT "parts_sell_price_non_negative" CHECK ("parts"."sell_price_minor" is null or "parts"."sell_price_minor" >= 0),
	CONSTRAINT "parts_markup_non_negative" CHECK ("parts"."markup_basis_points" is null or "parts"."markup_basis_points" >= 0),
	CONSTRAINT "parts_reorder_level_non_negative" CHECK ("parts"."reorder_level_milli" >= 0)
);
--> statement-breakpoint
CREATE TABLE "stock_movements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"part_id" uuid NOT NULL,
	"kind" "stock_movement_kind" NOT NULL,
	"quantity_milli" bigint NOT NULL,
	"unit_cost_minor" bigint NOT NULL,
	"value_minor" bigint NOT NULL,
	"task_id" uuid,
	"job_id" uuid,
	"reason" text,
	"by_user_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_movements_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "stock_movements_quantity_not_zero" CHECK ("stock_movements"."quantity_milli" <> 0),
	CONSTRAINT "stock_movements_unit_cost_non_negative" CHECK ("stock_movements"."unit_cost_minor" >= 0),
	CONSTRAINT "stock_movements_value_same_sign" CHECK (("stock_movements"."quantity_milli" > 0 and "stock_movements"."value_minor" >= 0) or ("stock_movements"."quantity_milli" < 0 and "stock_movements"."value_minor" <= 0)),
	CONSTRAINT "stock_movements_task_with_job" CHECK (("stock_movements"."task_id" is null) = ("stock_movements"."job_id" is null)),
	CONSTRAINT "stock_movements_kind_rules" CHECK (case "stock_movements"."kind"
        when 'received' then "stock_movements"."quantity_milli" > 0 and "stock_movements"."task_id" is null
        when 'used' then "stock_movements"."quantity_milli" < 0 and "stock_movements"."task_id" is not null
        when 'returned' then "stock_movements"."quantity_milli" > 0 and "stock_movements"."task_id" is not null
        else length(trim(coalesce("stock_movements"."reason", ''))) >= 3
      end)
);
--> statement-breakpoint
CREATE TABLE "estimate_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"estimate_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"kind" "estimate_line_kind" NOT NULL,
	"description" text NOT NULL,
	"task_id" uuid,
	"part_id" uuid,
	"option_id" uuid,
	"minutes" integer,
	"quantity_milli" bigint,
	"unit_price_minor" bigint NOT NULL,
	"unit_cost_minor" bigint,
	"amount_minor" bigint NOT NULL,
	"cost_minor" bigint,
	CONSTRAINT "estimate_lines_position" UNIQUE("estimate_id","position"),
	CONSTRAINT "estimate_lines_description_not_blank" CHECK (length(trim("estimate_lines"."description")) > 0),
	CONSTRAINT "estimate_lines_position_non_negative" CHECK ("estimate_lines"."position" >= 0),
	CONSTRAINT "estimate_lines_kind_rules" CHECK (case when "estimate_lines"."kind" = 'labour'
        then "estimate_lines"."minutes" > 0 and "estimate_lines"."quantity_milli" is null and "estimate_lines"."part_id" is null and "estimate_lines"."unit_cost_minor" is null and "estimate_lines"."cost_minor" is null
        else "estimate_lines"."quantity_milli" > 0 and "estimate_lines"."minutes" is null and "estimate_lines"."task_id" is null and ("estimate_lines"."kind" = 'part') = ("estimate_lines"."part_id" is not null)
      end),
	CONSTRAINT "estimate_lines_money_non_negative" CHECK ("estimate_lines"."unit_price_minor" >= 0 and "estimate_lines"."amount_minor" >= 0 and coalesce("estimate_lines"."unit_cost_minor", 0) >= 0 and coalesce("estimate_lines"."cost_minor", 0) >= 0),
	CONSTRAINT "estimate_lines_cost_with_unit_cost" CHECK (("estimate_lines"."unit_cost_minor" is null) = ("estimate_lines"."cost_minor" is null))
);
--> statement-breakpoint
CREATE TABLE "estimate_options" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"estimate_id" uuid NOT NULL,
	"key" text NOT NULL,
	"choice" text NOT NULL,
	"name" text NOT NULL,
	"position" integer NOT NULL,
	"is_chosen" boolean DEFAULT false NOT NULL,
	CONSTRAINT "estimate_options_id_estimate" UNIQUE("id","estimate_id"),
	CONSTRAINT "estimate_options_key" UNIQUE("estimate_id","key"),
	CONSTRAINT "estimate_options_position" UNIQUE("estimate_id","position"),
	CONSTRAINT "estimate_options_choice_not_blank" CHECK (length(trim("estimate_options"."choice")) > 0),
	CONSTRAINT "estimate_options_name_not_blank" CHECK (length(trim("estimate_options"."name")) > 0),
	CONSTRAINT "estimate_options_position_non_negative" CHECK ("estimate_options"."position" >= 0)
);
--> statement-breakpoint
CREATE TABLE "estimates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"kind" "estimate_kind" NOT NULL,
	"status" "estimate_status" DEFAULT 'draft' NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"accepted_net_minor" bigint,
	"issued_at" timestamp with time zone,
	"accepted_at" timestamp with time zone,
	"accepted_by" uuid,
	"declined_at" timestamp with time zone,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "estimates_id_workshop" UNIQUE("id","workshop_id"),
	CONSTRAINT "estimates_id_job" UNIQUE("id","job_id"),
	CONSTRAINT "estimates_revision_per_job" UNIQUE("job_id","revision"),
	CONSTRAINT "estimates_revision_positive" CHECK ("estimates"."revision" >= 1),
	CONSTRAINT "estimates_version_positive" CHECK ("estimates"."version" >= 1),
	CONSTRAINT "estimates_issued_when_not_draft" CHECK (("estimates"."status" = 'draft') = ("estimates"."issued_at" is null) or "estimates"."status" = 'superseded'),
	CONSTRAINT "estimates_accepted_has_price" CHECK (("estimates"."status" = 'accepted') = ("estimates"."accepted_at" is not null and "estimates"."accepted_net_minor" is not null)),
	CONSTRAINT "estimates_accepted_net_non_negative" CHECK ("estimates"."accepted_net_minor" is null or "estimates"."accepted_net_minor" >= 0),
	CONSTRAINT "estimates_declined_has_time" CHECK (("estimates"."status" = 'declined') = ("estimates"."declined_at" is not null))
);
--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "tax_rate_basis_points" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "labour_rate_minor_per_hour" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "target_margin_basis_points" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "allow_negative_stock" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "working_day_start" text DEFAULT '08:00' NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "working_day_end" text DEFAULT '17:30' NOT NULL;--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "working_weekdays" smallint[] DEFAULT '{1,2,3,4,5}'::smallint[] NOT NULL;--> statement-breakpoint
ALTER TABLE "sublet_bills" ADD CONSTRAINT "sublet_bills_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sublet_bills" ADD CONSTRAINT "sublet_bills_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sublet_bills" ADD CONSTRAINT "sublet_bills_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "technician_cost_rates" ADD CONSTRAINT "technician_cost_rates_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "technician_cost_rates" ADD CONSTRAINT "technician_cost_rates_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "technician_cost_rates" ADD CONSTRAINT "technician_cost_rates_member_same_workshop" FOREIGN KEY ("workshop_id","user_id") REFERENCES "public"."memberships"("workshop_id","user_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_part_same_workshop" FOREIGN KEY ("part_id","workshop_id") REFERENCES "public"."parts"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_task_same_job_and_workshop" FOREIGN KEY ("task_id","job_id","workshop_id") REFERENCES "public"."tasks"("id","job_id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_estimate_same_job" FOREIGN KEY ("estimate_id","job_id") REFERENCES "public"."estimates"("id","job_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_estimate_same_workshop" FOREIGN KEY ("estimate_id","workshop_id") REFERENCES "public"."estimates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_option_same_estimate" FOREIGN KEY ("option_id","estimate_id") REFERENCES "public"."estimate_options"("id","estimate_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_task_same_job" FOREIGN KEY ("task_id","job_id","workshop_id") REFERENCES "public"."tasks"("id","job_id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_part_same_workshop" FOREIGN KEY ("part_id","workshop_id") REFERENCES "public"."parts"("id","workshop_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_options" ADD CONSTRAINT "estimate_options_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_options" ADD CONSTRAINT "estimate_options_estimate_same_workshop" FOREIGN KEY ("estimate_id","workshop_id") REFERENCES "public"."estimates"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_accepted_by_users_id_fk" FOREIGN KEY ("accepted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_job_same_workshop" FOREIGN KEY ("job_id","workshop_id") REFERENCES "public"."jobs"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "sublet_bills_job_id_index" ON "sublet_bills" USING btree ("job_id");--> statement-breakpoint
CREATE UNIQUE INDEX "parts_sku_per_workshop" ON "parts" USING btree ("workshop_id",lower("sku"));--> statement-breakpoint
CREATE INDEX "stock_movements_part_id_at_index" ON "stock_movements" USING btree ("part_id","at");--> statement-breakpoint
CREATE INDEX "stock_movements_job_id_index" ON "stock_movements" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "stock_movements_task_id_index" ON "stock_movements" USING btree ("task_id");--> statement-breakpoint
CREATE INDEX "estimate_lines_estimate_id_index" ON "estimate_lines" USING btree ("estimate_id");--> statement-breakpoint
CREATE INDEX "estimate_lines_task_id_index" ON "estimate_lines" USING btree ("task_id");--> statement-breakpoint
CREATE INDEX "estimate_lines_job_id_index" ON "estimate_lines" USING btree ("job_id");--> statement-breakpoint
CREATE UNIQUE INDEX "estimates_one_accepted_original" ON "estimates" USING btree ("job_id") WHERE "estimates"."kind" = 'original' and "estimates"."status" = 'accepted';--> statement-breakpoint
CREATE INDEX "estimates_workshop_id_status_index" ON "estimates" USING btree ("workshop_id","status");--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_tax_rate_range" CHECK ("workshops"."tax_rate_basis_points" between 0 and 10000);--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_labour_rate_non_negative" CHECK ("workshops"."labour_rate_minor_per_hour" >= 0);--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_target_margin_range" CHECK ("workshops"."target_margin_basis_points" between 0 and 9999);--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_working_day_hhmm" CHECK ("workshops"."working_day_start" ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$' and "workshops"."working_day_end" ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$');--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_working_day_order" CHECK ("workshops"."working_day_start" < "workshops"."working_day_end");--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_working_weekdays" CHECK (cardinality("workshops"."working_weekdays") between 1 and 7 and "workshops"."working_weekdays" <@ '{1,2,3,4,5,6,7}'::smallint[]);