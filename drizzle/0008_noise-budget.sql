ALTER TABLE "chains" ADD COLUMN "front_end_loss_db" double precision DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "chains" ADD COLUMN "front_end_temperature_k" double precision DEFAULT 290 NOT NULL;--> statement-breakpoint
ALTER TABLE "channels" ADD COLUMN "receiver_k_source" text DEFAULT 'entered' NOT NULL;--> statement-breakpoint
ALTER TABLE "detectors" ADD COLUMN "responsivity_a_per_w" double precision;--> statement-breakpoint
ALTER TABLE "detectors" ADD COLUMN "quantum_efficiency" double precision;--> statement-breakpoint
ALTER TABLE "detectors" ADD COLUMN "noise_current_pa_per_rt_hz" double precision;--> statement-breakpoint
ALTER TABLE "detectors" ADD COLUMN "cmrr_db" double precision;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "carrier_rin_dbc_per_hz" double precision;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "lo_rin_dbc_per_hz" double precision;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "carrier_floor_dbc_per_hz" double precision;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "lo_floor_dbc_per_hz" double precision;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "carrier_pre_filter_db" double precision DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "lasers" ADD COLUMN "lo_pre_filter_db" double precision DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "intrinsic_q" double precision;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "conversion_efficiency" double precision;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "g0_hz" double precision;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "mm_wave_q" double precision;--> statement-breakpoint
ALTER TABLE "resonators" ADD COLUMN "mm_wave_coupling_ratio" double precision;