ALTER TABLE `projects` ADD `enclosure_area_m2` real;--> statement-breakpoint
ALTER TABLE `projects` ADD `enclosure_u_w_per_m2k` real;