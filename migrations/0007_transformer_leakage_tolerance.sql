ALTER TABLE `transformers` ADD `secondary_tolerance_fraction` real DEFAULT 0.05;--> statement-breakpoint
ALTER TABLE `windings` ADD `leakage_h` real;