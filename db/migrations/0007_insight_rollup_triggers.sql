-- Marks the insight roll-up days an outcome change touches (see insight_rollup_dirty in
-- src/schema/learning.ts): the UTC day of every inserted, updated or deleted row, and the day of
-- any outcome such a row supersedes (a correction changes which of the two counts).
-- Statement-level triggers with transition tables: one bulk insert marks each day once.
CREATE FUNCTION "insight_rollup_mark_new"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO "insight_rollup_dirty" ("ruleset_version", "day")
  SELECT DISTINCT "ruleset_version", ("at" AT TIME ZONE 'UTC')::date FROM "fw_changed_rows"
  UNION
  SELECT DISTINCT s."ruleset_version", (s."at" AT TIME ZONE 'UTC')::date
  FROM "fw_changed_rows" c JOIN "outcomes" s ON s."id" = c."supersedes_id"
  ON CONFLICT DO NOTHING;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION "insight_rollup_mark_old"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO "insight_rollup_dirty" ("ruleset_version", "day")
  SELECT DISTINCT "ruleset_version", ("at" AT TIME ZONE 'UTC')::date FROM "fw_old_rows"
  UNION
  SELECT DISTINCT s."ruleset_version", (s."at" AT TIME ZONE 'UTC')::date
  FROM "fw_old_rows" c JOIN "outcomes" s ON s."id" = c."supersedes_id"
  ON CONFLICT DO NOTHING;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER "outcomes_insight_rollup_insert" AFTER INSERT ON "outcomes"
  REFERENCING NEW TABLE AS "fw_changed_rows" FOR EACH STATEMENT EXECUTE FUNCTION "insight_rollup_mark_new"();
--> statement-breakpoint
CREATE TRIGGER "outcomes_insight_rollup_update_new" AFTER UPDATE ON "outcomes"
  REFERENCING NEW TABLE AS "fw_changed_rows" FOR EACH STATEMENT EXECUTE FUNCTION "insight_rollup_mark_new"();
--> statement-breakpoint
CREATE TRIGGER "outcomes_insight_rollup_update_old" AFTER UPDATE ON "outcomes"
  REFERENCING OLD TABLE AS "fw_old_rows" FOR EACH STATEMENT EXECUTE FUNCTION "insight_rollup_mark_old"();
--> statement-breakpoint
CREATE TRIGGER "outcomes_insight_rollup_delete" AFTER DELETE ON "outcomes"
  REFERENCING OLD TABLE AS "fw_old_rows" FOR EACH STATEMENT EXECUTE FUNCTION "insight_rollup_mark_old"();
--> statement-breakpoint
-- Outcomes logged before the roll-ups existed: every day they cover is to be built.
INSERT INTO "insight_rollup_dirty" ("ruleset_version", "day")
SELECT DISTINCT "ruleset_version", ("at" AT TIME ZONE 'UTC')::date FROM "outcomes"
ON CONFLICT DO NOTHING;
