-- Positions are unique, but checked at commit so that a move or reorder can shift many rows in one transaction.
ALTER TABLE "stages" ADD CONSTRAINT "stages_workshop_position_unique" UNIQUE ("workshop_id", "position") DEFERRABLE INITIALLY DEFERRED;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_stage_position_unique" UNIQUE ("stage_id", "position") DEFERRABLE INITIALLY DEFERRED;--> statement-breakpoint
-- Workshops created before stages existed get the default six.
INSERT INTO "stages" ("workshop_id", "name", "position")
SELECT w.id, s.name, s.position
FROM "workshops" w
CROSS JOIN (VALUES ('Intake', 0), ('Strip-down', 1), ('Hammers', 2), ('Regulation', 3), ('Finish', 4), ('Delivery', 5)) AS s(name, position)
WHERE NOT EXISTS (SELECT 1 FROM "stages" x WHERE x.workshop_id = w.id);
