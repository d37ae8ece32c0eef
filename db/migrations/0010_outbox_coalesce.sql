ALTER TABLE "outbox" ADD COLUMN "coalesce_key" text;--> statement-breakpoint
ALTER TABLE "outbox" ADD COLUMN "coalesced_steps" jsonb;