CREATE TABLE `project_versions` (
	`project_id` text NOT NULL,
	`version` integer NOT NULL,
	`snapshot` text NOT NULL,
	PRIMARY KEY(`project_id`, `version`),
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
