CREATE TYPE "public"."case_event_type" AS ENUM('opened', 'symptoms-reported', 'check-recorded', 'resolved', 'abandoned', 'stopped');--> statement-breakpoint
CREATE TYPE "public"."case_state" AS ENUM('open', 'resolved', 'abandoned', 'stopped');--> statement-breakpoint
CREATE TABLE "case_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"case_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"type" "case_event_type" NOT NULL,
	"payload" jsonb NOT NULL,
	"actor_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "case_events_case_id_seq_unique" UNIQUE("case_id","seq")
);
--> statement-breakpoint
CREATE TABLE "cases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"kart_id" uuid NOT NULL,
	"state" "case_state" DEFAULT 'open' NOT NULL,
	"ruleset_version" text NOT NULL,
	"symptom_ids" text[] NOT NULL,
	"top_cause_id" text,
	"top_cause_probability" double precision,
	"snapshot" jsonb NOT NULL,
	"revision" integer NOT NULL,
	"opened_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_kart_id_karts_id_fk" FOREIGN KEY ("kart_id") REFERENCES "public"."karts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "cases_owner_id_updated_at_idx" ON "cases" USING btree ("owner_id","updated_at");--> statement-breakpoint
CREATE INDEX "cases_kart_id_idx" ON "cases" USING btree ("kart_id");