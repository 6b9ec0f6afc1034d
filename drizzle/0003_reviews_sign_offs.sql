CREATE TABLE `deposits` (
	`id` int AUTO_INCREMENT NOT NULL,
	`review_id` int NOT NULL,
	`project_id` int NOT NULL,
	`amount_minor` int NOT NULL,
	`currency` char(3) NOT NULL,
	`status` enum('on-approval','due','paid') NOT NULL DEFAULT 'on-approval',
	`checkout_session_id` varchar(255),
	`paid_at` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	`updated_at` timestamp(3) NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `deposits_id` PRIMARY KEY(`id`),
	CONSTRAINT `deposits_review` UNIQUE(`review_id`)
);
--> statement-breakpoint
CREATE TABLE `payment_events` (
	`id` int AUTO_INCREMENT NOT NULL,
	`event_id` varchar(255) NOT NULL,
	`type` varchar(100) NOT NULL,
	`deposit_id` int,
	`received_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `payment_events_id` PRIMARY KEY(`id`),
	CONSTRAINT `payment_events_event_id_unique` UNIQUE(`event_id`)
);
--> statement-breakpoint
CREATE TABLE `review_comments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`review_id` int NOT NULL,
	`author_id` int NOT NULL,
	`text` varchar(4000) NOT NULL,
	`at` double,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `review_comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reviews` (
	`id` int AUTO_INCREMENT NOT NULL,
	`revision_id` int NOT NULL,
	`project_id` int NOT NULL,
	`message` varchar(2000) NOT NULL,
	`run_length_mm` double,
	`end_treatment` enum('flat','half','scale'),
	`requested_by_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `reviews_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sign_offs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`review_id` int NOT NULL,
	`revision_id` int NOT NULL,
	`spec_hash` char(64) NOT NULL,
	`engine_version` varchar(32) NOT NULL,
	`decision` enum('approve','request-changes') NOT NULL,
	`typed_name` varchar(160) NOT NULL,
	`user_id` int NOT NULL,
	`comment_id` int,
	`signed_at` timestamp(3) NOT NULL DEFAULT (now()),
	`address` varchar(64) NOT NULL,
	`user_agent` varchar(500) NOT NULL,
	CONSTRAINT `sign_offs_id` PRIMARY KEY(`id`),
	CONSTRAINT `sign_offs_review` UNIQUE(`review_id`)
);
--> statement-breakpoint
ALTER TABLE `deposits` ADD CONSTRAINT `deposits_review_id_reviews_id_fk` FOREIGN KEY (`review_id`) REFERENCES `reviews`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `deposits` ADD CONSTRAINT `deposits_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `payment_events` ADD CONSTRAINT `payment_events_deposit_id_deposits_id_fk` FOREIGN KEY (`deposit_id`) REFERENCES `deposits`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_review_id_reviews_id_fk` FOREIGN KEY (`review_id`) REFERENCES `reviews`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reviews` ADD CONSTRAINT `reviews_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reviews` ADD CONSTRAINT `reviews_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reviews` ADD CONSTRAINT `reviews_requested_by_id_users_id_fk` FOREIGN KEY (`requested_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_offs` ADD CONSTRAINT `sign_offs_review_id_reviews_id_fk` FOREIGN KEY (`review_id`) REFERENCES `reviews`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_offs` ADD CONSTRAINT `sign_offs_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_offs` ADD CONSTRAINT `sign_offs_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_offs` ADD CONSTRAINT `sign_offs_comment_id_review_comments_id_fk` FOREIGN KEY (`comment_id`) REFERENCES `review_comments`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `deposits_project` ON `deposits` (`project_id`);--> statement-breakpoint
CREATE INDEX `review_comments_review` ON `review_comments` (`review_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `reviews_revision` ON `reviews` (`revision_id`);--> statement-breakpoint
CREATE INDEX `reviews_project` ON `reviews` (`project_id`);--> statement-breakpoint
CREATE INDEX `sign_offs_revision` ON `sign_offs` (`revision_id`,`decision`);--> statement-breakpoint
CREATE TRIGGER `sign_offs_no_update` BEFORE UPDATE ON `sign_offs` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Sign-offs are permanent: a later decision needs a new review.';
--> statement-breakpoint
CREATE TRIGGER `sign_offs_no_delete` BEFORE DELETE ON `sign_offs` FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'Sign-offs are permanent and are not deleted.';
