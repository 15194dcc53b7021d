ALTER TABLE "chains" ADD COLUMN "temperature_excursion_k" double precision DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "channels" ADD COLUMN "if_filter" text DEFAULT 'slot' NOT NULL;--> statement-breakpoint
ALTER TABLE "channels" ADD COLUMN "centre_tolerance_mhz" double precision;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "fsr_shift_mhz_per_k" double precision DEFAULT 0 NOT NULL;