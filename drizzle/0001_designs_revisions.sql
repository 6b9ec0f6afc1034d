CREATE TABLE `designs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`project_id` int NOT NULL,
	`name` varchar(160) NOT NULL,
	`mode` enum('track-for-wheel','wheel-for-track','partner-wheel','twin-wheels') NOT NULL,
	`draft` json NOT NULL,
	`created_by_id` int,
	`created_at` timestamp NOT NULL DEFAULT (now()),
	`updated_at` timestamp NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `designs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `revisions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`design_id` int NOT NULL,
	`number` int NOT NULL,
	`spec` json NOT NULL,
	`spec_hash` char(64) NOT NULL,
	`engine_version` varchar(32) NOT NULL,
	`summary` json NOT NULL,
	`note` varchar(500) NOT NULL DEFAULT '',
	`created_by_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `revisions_design_number` UNIQUE(`design_id`,`number`)
);
--> statement-breakpoint
ALTER TABLE `designs` ADD CONSTRAINT `designs_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `designs` ADD CONSTRAINT `designs_created_by_id_users_id_fk` FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_design_id_designs_id_fk` FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `revisions` ADD CONSTRAINT `revisions_created_by_id_users_id_fk` FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `designs_project` ON `designs` (`project_id`);--> statement-breakpoint
CREATE INDEX `revisions_hash` ON `revisions` (`spec_hash`);--> statement-breakpoint
CREATE TRIGGER `revisions_no_update` BEFORE UPDATE ON `revisions` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Revisions are immutable: save a new revision instead.';
--> statement-breakpoint
CREATE TRIGGER `revisions_no_delete` BEFORE DELETE ON `revisions` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Revisions are immutable and are not deleted.';
