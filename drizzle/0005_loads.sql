ALTER TABLE `designs` ADD `loads` json;--> statement-breakpoint
ALTER TABLE `materials` ADD `kind` enum('sheet','tread') DEFAULT 'sheet' NOT NULL;--> statement-breakpoint
ALTER TABLE `materials` ADD `poisson` double DEFAULT 0.3 NOT NULL;--> statement-breakpoint
ALTER TABLE `materials` ADD `allowable_mpa` double;--> statement-breakpoint
ALTER TABLE `revisions` ADD `loads` json;