ALTER TABLE "coils" ALTER COLUMN "kind" SET DATA TYPE text;--> statement-breakpoint
DROP TYPE "public"."coil_kind";--> statement-breakpoint
CREATE TYPE "public"."coil_kind" AS ENUM('ring', 'rings', 'circular-spiral', 'rectangular-spiral', 'solenoid', 'path');--> statement-breakpoint
ALTER TABLE "coils" ALTER COLUMN "kind" SET DATA TYPE "public"."coil_kind" USING "kind"::"public"."coil_kind";--> statement-breakpoint
ALTER TABLE "coils" ADD COLUMN "description" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "coils" ADD COLUMN "rated_current_a" double precision;--> statement-breakpoint
ALTER TABLE "coils" ADD COLUMN "dc_resistance_ohm" double precision;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "tx_current_a" double precision;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "threshold_kind" text DEFAULT 'k' NOT NULL;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "min_efficiency" double precision;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "compensation" text DEFAULT 'series-series' NOT NULL;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "notes" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "studies" ADD COLUMN "nominal_pose" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "study_revisions" ADD COLUMN "summary" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "sweep_runs" ADD COLUMN "kind" text DEFAULT 'xy-map' NOT NULL;--> statement-breakpoint
ALTER TABLE "sweep_runs" ADD COLUMN "inputs_hash" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "sweep_runs" ADD COLUMN "cancel_requested_at" timestamp with time zone;