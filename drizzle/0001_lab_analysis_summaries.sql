CREATE TABLE "analysis_summaries" (
	"revision_id" uuid PRIMARY KEY NOT NULL,
	"intersection_count" integer NOT NULL,
	"generator_count" text,
	"nice" boolean,
	"weakly_admissible" boolean,
	"h1" text
);
--> statement-breakpoint
ALTER TABLE "analysis_summaries" ADD CONSTRAINT "analysis_summaries_revision_id_diagram_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."diagram_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
-- Backfill for analyses finished before this table existed.
INSERT INTO "analysis_summaries" ("revision_id", "intersection_count", "generator_count", "nice", "weakly_admissible", "h1")
SELECT "revision_id", jsonb_array_length("result"->'intersections'), "result"->'floer'->>'generatorCount',
  ("result"->'floer'->>'nice')::boolean, ("result"->'floer'->>'weaklyAdmissible')::boolean, "result"->'floer'->>'h1'
FROM "analyses" WHERE "status" = 'done' AND "result" IS NOT NULL AND jsonb_typeof("result"->'intersections') = 'array';
