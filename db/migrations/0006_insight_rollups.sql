CREATE TYPE "public"."insight_rollup_kind" AS ENUM('day', 'month');--> statement-breakpoint
CREATE TABLE "insight_rollup_dirty" (
	"ruleset_version" text NOT NULL,
	"day" date NOT NULL,
	CONSTRAINT "insight_rollup_dirty_ruleset_version_day_pk" PRIMARY KEY("ruleset_version","day")
);
--> statement-breakpoint
CREATE TABLE "insight_rollups" (
	"ruleset_version" text NOT NULL,
	"kind" "insight_rollup_kind" NOT NULL,
	"start" date NOT NULL,
	"outcomes" integer NOT NULL,
	"state" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "insight_rollups_ruleset_version_kind_start_pk" PRIMARY KEY("ruleset_version","kind","start")
);
