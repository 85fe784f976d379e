ALTER TABLE `projects` ADD `primary_fuse_sheet` text;--> statement-breakpoint
ALTER TABLE `projects` ADD `transformer_sizing` text;