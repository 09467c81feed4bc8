-- One technician's entries never overlap: the ranges [started_at, ended_at) of one technician in one
-- workshop are disjoint, and a running entry (ended_at null) reaches to infinity. btree_gist lets
-- the uuid equality columns share the GiST index with the range.
CREATE EXTENSION IF NOT EXISTS btree_gist;--> statement-breakpoint
ALTER TABLE "time_entries" ADD CONSTRAINT "time_entries_no_overlap" EXCLUDE USING gist (
  "workshop_id" WITH =,
  "technician_id" WITH =,
  tstzrange("started_at", coalesce("ended_at", 'infinity'::timestamptz), '[)') WITH &&
);--> statement-breakpoint
-- Task positions are unique per job, checked at commit so a reorder can shift many rows in one transaction.
ALTER TABLE "tasks" ADD CONSTRAINT "tasks_job_position_unique" UNIQUE ("job_id", "position") DEFERRABLE INITIALLY DEFERRED;
