CREATE TYPE "public"."idle_screw" AS ENUM('backed-off', 'set');--> statement-breakpoint
CREATE TABLE "setups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kart_id" uuid NOT NULL,
	"taken_on" date NOT NULL,
	"main_jet" double precision,
	"pilot_jet" double precision,
	"needle_clip_groove" integer,
	"air_screw_turns_out" double precision,
	"idle_screw" "idle_screw",
	"idle_screw_turns" double precision,
	"foam_fitted_date" date,
	"last_rebuild_date" date,
	"premix_ratio" double precision,
	"vent_lines_fitted" boolean,
	"vent_lines_routed_up" boolean,
	"note" text DEFAULT '' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "setups" ADD CONSTRAINT "setups_kart_id_karts_id_fk" FOREIGN KEY ("kart_id") REFERENCES "public"."karts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setups" ADD CONSTRAINT "setups_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "setups_kart_id_taken_on_idx" ON "setups" USING btree ("kart_id","taken_on");