CREATE TABLE `bom_lines` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`position` integer NOT NULL,
	`stage_id` text,
	`part_id` text NOT NULL,
	`qty_per_rig` real NOT NULL,
	`refs` text DEFAULT '' NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `bom_lines_project` ON `bom_lines` (`project_id`);--> statement-breakpoint
CREATE TABLE `offers` (
	`id` text PRIMARY KEY NOT NULL,
	`part_id` text NOT NULL,
	`position` integer NOT NULL,
	`supplier` text NOT NULL,
	`sku` text NOT NULL,
	`currency` text NOT NULL,
	`breaks` text NOT NULL,
	`min_order` integer NOT NULL,
	`order_multiple` integer NOT NULL,
	`stock_note` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`part_id`) REFERENCES `parts`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `offers_part` ON `offers` (`part_id`);--> statement-breakpoint
CREATE TABLE `parts` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`position` integer NOT NULL,
	`description` text NOT NULL,
	`category` text NOT NULL,
	`ratings` text NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `parts_project` ON `parts` (`project_id`);--> statement-breakpoint
CREATE TABLE `projects` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`frequency_hz` real NOT NULL,
	`target_power_w` real NOT NULL,
	`mains_nominal_v` real,
	`mains_frequency_hz` real,
	`mains_low_fraction` real,
	`mains_high_fraction` real,
	`ambient_c` real NOT NULL,
	`currency` text NOT NULL,
	`kits` integer NOT NULL,
	`keying_duty` real NOT NULL,
	`primary_fuse_a` real,
	`rf` text NOT NULL,
	`costing` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL
);
--> statement-breakpoint
CREATE TABLE `rails` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`kind` text NOT NULL,
	`params` text NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `rails_project` ON `rails` (`project_id`);--> statement-breakpoint
CREATE TABLE `stage_loads` (
	`id` text PRIMARY KEY NOT NULL,
	`stage_id` text NOT NULL,
	`rail_id` text NOT NULL,
	`position` integer NOT NULL,
	`receive_a` real NOT NULL,
	`key_up_a` real NOT NULL,
	`key_down_a` real NOT NULL,
	FOREIGN KEY (`stage_id`) REFERENCES `stages`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `stage_loads_stage` ON `stage_loads` (`stage_id`);--> statement-breakpoint
CREATE TABLE `stages` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`position` integer NOT NULL,
	`kind` text NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`dissipation_w` real,
	`params` text,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `stages_project` ON `stages` (`project_id`);--> statement-breakpoint
CREATE TABLE `transformers` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`construction` text NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `transformers_project` ON `transformers` (`project_id`);--> statement-breakpoint
CREATE TABLE `windings` (
	`id` text PRIMARY KEY NOT NULL,
	`transformer_id` text NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`rated_vrms` real NOT NULL,
	`rated_a` real NOT NULL,
	`regulation_fraction` real NOT NULL,
	`resistance_ohm` real,
	FOREIGN KEY (`transformer_id`) REFERENCES `transformers`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `windings_transformer` ON `windings` (`transformer_id`);