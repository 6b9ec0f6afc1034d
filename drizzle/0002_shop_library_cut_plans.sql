CREATE TABLE `cut_plans` (
	`id` int AUTO_INCREMENT NOT NULL,
	`revision_id` int NOT NULL,
	`settings` json NOT NULL,
	`nest` json NOT NULL,
	`summary` json NOT NULL,
	`created_by_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT (now()),
	CONSTRAINT `cut_plans_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `machines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`kind` enum('router','laser','waterjet','plasma') NOT NULL,
	`kerf_mm` double NOT NULL,
	`bed_length_mm` double NOT NULL,
	`bed_width_mm` double NOT NULL,
	`min_inside_radius_mm` double NOT NULL,
	`source` varchar(500) NOT NULL,
	`source_kind` enum('published','common-practice','measured') NOT NULL,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` timestamp NOT NULL DEFAULT (now()),
	`updated_at` timestamp NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `machines_id` PRIMARY KEY(`id`),
	CONSTRAINT `machines_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `materials` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`thickness_mm` double NOT NULL,
	`density_kg_m3` double NOT NULL,
	`modulus_gpa` double NOT NULL,
	`strength_mpa` double NOT NULL,
	`friction_static` double NOT NULL,
	`friction_kinetic` double,
	`friction_pair` varchar(160) NOT NULL DEFAULT '',
	`source` varchar(500) NOT NULL,
	`source_kind` enum('published','common-practice','measured') NOT NULL,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` timestamp NOT NULL DEFAULT (now()),
	`updated_at` timestamp NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `materials_id` PRIMARY KEY(`id`),
	CONSTRAINT `materials_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `stock_sheets` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`material_id` int NOT NULL,
	`length_mm` double NOT NULL,
	`width_mm` double NOT NULL,
	`grain` enum('length','width','none') NOT NULL DEFAULT 'length',
	`source` varchar(500) NOT NULL,
	`source_kind` enum('published','common-practice','measured') NOT NULL,
	`active` boolean NOT NULL DEFAULT true,
	`created_at` timestamp NOT NULL DEFAULT (now()),
	`updated_at` timestamp NOT NULL DEFAULT (now()) ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `stock_sheets_id` PRIMARY KEY(`id`),
	CONSTRAINT `stock_sheets_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
ALTER TABLE `cut_plans` ADD CONSTRAINT `cut_plans_revision_id_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `cut_plans` ADD CONSTRAINT `cut_plans_created_by_id_users_id_fk` FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_sheets` ADD CONSTRAINT `stock_sheets_material_id_materials_id_fk` FOREIGN KEY (`material_id`) REFERENCES `materials`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `cut_plans_revision` ON `cut_plans` (`revision_id`);