CREATE TYPE "public"."proposal_status" AS ENUM('running', 'ready', 'failed', 'published', 'discarded');--> statement-breakpoint
CREATE TYPE "public"."work_order_status" AS ENUM('open', 'done');--> statement-breakpoint
CREATE TABLE "outcomes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"case_id" uuid,
	"work_order_id" uuid,
	"kart_id" uuid,
	"logged_by" uuid,
	"ruleset_version" text NOT NULL,
	"symptoms" jsonb NOT NULL,
	"setup" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"opening_rank" jsonb NOT NULL,
	"confirmed_causes" text[] NOT NULL,
	"other_note" text DEFAULT '' NOT NULL,
	"fix" text NOT NULL,
	"parts" text DEFAULT '' NOT NULL,
	"labour_minutes" integer,
	"still_fixed" boolean,
	"supersedes_id" uuid,
	"demo" boolean DEFAULT false NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "proposals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"base_version" text NOT NULL,
	"proposed_version" text NOT NULL,
	"strength" double precision NOT NULL,
	"seed" integer NOT NULL,
	"hold_out_fraction" double precision NOT NULL,
	"status" "proposal_status" DEFAULT 'running' NOT NULL,
	"progress" double precision DEFAULT 0 NOT NULL,
	"result" jsonb,
	"error" text,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "rulesets" (
	"version" text PRIMARY KEY NOT NULL,
	"source" jsonb NOT NULL,
	"parent_version" text,
	"notes" text DEFAULT '' NOT NULL,
	"active" boolean DEFAULT false NOT NULL,
	"published_by" uuid,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "work_orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"case_id" uuid,
	"customer_name" text NOT NULL,
	"kart_description" text DEFAULT '' NOT NULL,
	"symptoms" jsonb NOT NULL,
	"setup" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"status" "work_order_status" DEFAULT 'open' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "outcomes" ADD CONSTRAINT "outcomes_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcomes" ADD CONSTRAINT "outcomes_work_order_id_work_orders_id_fk" FOREIGN KEY ("work_order_id") REFERENCES "public"."work_orders"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcomes" ADD CONSTRAINT "outcomes_kart_id_karts_id_fk" FOREIGN KEY ("kart_id") REFERENCES "public"."karts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outcomes" ADD CONSTRAINT "outcomes_logged_by_users_id_fk" FOREIGN KEY ("logged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "proposals" ADD CONSTRAINT "proposals_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rulesets" ADD CONSTRAINT "rulesets_published_by_users_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_shop_id_users_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "outcomes_version_at_idx" ON "outcomes" USING btree ("ruleset_version","at");--> statement-breakpoint
CREATE INDEX "outcomes_case_id_idx" ON "outcomes" USING btree ("case_id");--> statement-breakpoint
CREATE INDEX "outcomes_supersedes_id_idx" ON "outcomes" USING btree ("supersedes_id");--> statement-breakpoint
CREATE INDEX "work_orders_shop_id_idx" ON "work_orders" USING btree ("shop_id","created_at");