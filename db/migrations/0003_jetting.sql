CREATE TYPE "public"."plug_colour" AS ENUM('white', 'light-tan', 'tan', 'dark-brown', 'black-wet');--> statement-breakpoint
CREATE TYPE "public"."ran" AS ENUM('rich', 'right', 'lean');--> statement-breakpoint
CREATE TABLE "jetting_sessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kart_id" uuid NOT NULL,
	"session_on" date NOT NULL,
	"track" text DEFAULT '' NOT NULL,
	"temperature_c" double precision NOT NULL,
	"station_pressure_hpa" double precision NOT NULL,
	"relative_humidity_pct" double precision NOT NULL,
	"density_kg_m3" double precision NOT NULL,
	"dry_air_density_kg_m3" double precision NOT NULL,
	"setup_id" uuid,
	"main_jet" double precision NOT NULL,
	"pilot_jet" double precision,
	"needle_clip_groove" integer,
	"air_screw_turns_out" double precision,
	"plug_colour" "plug_colour",
	"ran" "ran" NOT NULL,
	"lap_time_ms" integer,
	"note" text DEFAULT '' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "preferences" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "karts" ADD COLUMN "jet_kit" jsonb;--> statement-breakpoint
ALTER TABLE "jetting_sessions" ADD CONSTRAINT "jetting_sessions_kart_id_karts_id_fk" FOREIGN KEY ("kart_id") REFERENCES "public"."karts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jetting_sessions" ADD CONSTRAINT "jetting_sessions_setup_id_setups_id_fk" FOREIGN KEY ("setup_id") REFERENCES "public"."setups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jetting_sessions" ADD CONSTRAINT "jetting_sessions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "jetting_sessions_kart_id_session_on_idx" ON "jetting_sessions" USING btree ("kart_id","session_on");