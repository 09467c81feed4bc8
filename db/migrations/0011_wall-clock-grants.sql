CREATE TABLE "wall_clock_grants" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"device_id" uuid NOT NULL,
	"technician_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"issued_at" timestamp with time zone NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	CONSTRAINT "wall_clock_grants_token_hash" UNIQUE("token_hash"),
	CONSTRAINT "wall_clock_grants_lasts_24_hours" CHECK ("wall_clock_grants"."expires_at" = "wall_clock_grants"."issued_at" + interval '24 hours'),
	CONSTRAINT "wall_clock_grants_token_hash_sha256" CHECK ("wall_clock_grants"."token_hash" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
ALTER TABLE "wall_clock_grants" ADD CONSTRAINT "wall_clock_grants_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wall_clock_grants" ADD CONSTRAINT "wall_clock_grants_device_same_workshop" FOREIGN KEY ("device_id","workshop_id") REFERENCES "public"."wall_devices"("id","workshop_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wall_clock_grants" ADD CONSTRAINT "wall_clock_grants_technician_same_workshop" FOREIGN KEY ("workshop_id","technician_id") REFERENCES "public"."memberships"("workshop_id","user_id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "wall_clock_grants_workshop_id_technician_id_index" ON "wall_clock_grants" USING btree ("workshop_id","technician_id");--> statement-breakpoint
CREATE INDEX "wall_clock_grants_device_id_index" ON "wall_clock_grants" USING btree ("device_id");