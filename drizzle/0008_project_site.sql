-- What a project records of its site and stock, from which a new cut plan starts: the run length on site,
-- the track lines, the stock sheet and the machine (all nullable: not set yet). Library rows are retired,
-- never deleted, so the keys need no ON DELETE rule.
ALTER TABLE `projects` ADD `site_run_length_mm` double;--> statement-breakpoint
ALTER TABLE `projects` ADD `track_lines` int;--> statement-breakpoint
ALTER TABLE `projects` ADD `stock_sheet_id` int;--> statement-breakpoint
ALTER TABLE `projects` ADD `machine_id` int;--> statement-breakpoint
ALTER TABLE `projects` ADD CONSTRAINT `projects_stock_sheet_id_stock_sheets_id_fk` FOREIGN KEY (`stock_sheet_id`) REFERENCES `stock_sheets`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `projects` ADD CONSTRAINT `projects_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;