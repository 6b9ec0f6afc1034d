CREATE TABLE `ended_sessions` (
	`session_id` varchar(64) NOT NULL,
	`user_id` int NOT NULL,
	`ended_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `ended_sessions_session_id` PRIMARY KEY(`session_id`)
);
--> statement-breakpoint
ALTER TABLE `ended_sessions` ADD CONSTRAINT `ended_sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `ended_sessions_user` ON `ended_sessions` (`user_id`);