CREATE TABLE `build_log_entries` (
	`id` int AUTO_INCREMENT NOT NULL,
	`project_id` int NOT NULL,
	`kind` enum('note','cut','assembled','shipped','installed','inspection','problem','fixed','status','review','cut-plan') NOT NULL,
	`text` varchar(4000) NOT NULL,
	`parts` json NOT NULL,
	`cut_plan_id` int,
	`detail` json,
	`author_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `build_log_entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `build_log_photos` (
	`id` int AUTO_INCREMENT NOT NULL,
	`entry_id` int NOT NULL,
	`project_id` int NOT NULL,
	`object_key` varchar(200) NOT NULL,
	`thumb_key` varchar(200) NOT NULL,
	`content_type` varchar(40) NOT NULL,
	`bytes` int NOT NULL,
	`thumb_bytes` int NOT NULL,
	`width` int NOT NULL,
	`height` int NOT NULL,
	`original_name` varchar(200) NOT NULL DEFAULT '',
	`uploaded_by_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `build_log_photos_id` PRIMARY KEY(`id`),
	CONSTRAINT `build_log_photos_object_key_unique` UNIQUE(`object_key`),
	CONSTRAINT `build_log_photos_thumb_key_unique` UNIQUE(`thumb_key`)
);
--> statement-breakpoint
ALTER TABLE `build_log_entries` ADD CONSTRAINT `build_log_entries_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_log_entries` ADD CONSTRAINT `build_log_entries_cut_plan_id_cut_plans_id_fk` FOREIGN KEY (`cut_plan_id`) REFERENCES `cut_plans`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_log_entries` ADD CONSTRAINT `build_log_entries_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_log_photos` ADD CONSTRAINT `build_log_photos_entry_id_build_log_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `build_log_entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_log_photos` ADD CONSTRAINT `build_log_photos_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_log_photos` ADD CONSTRAINT `build_log_photos_uploaded_by_id_users_id_fk` FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `build_log_project` ON `build_log_entries` (`project_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `build_log_cut_plan` ON `build_log_entries` (`cut_plan_id`);--> statement-breakpoint
CREATE INDEX `build_log_photos_entry` ON `build_log_photos` (`entry_id`);