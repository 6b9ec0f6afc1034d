-- Each cut plan gets a number within its revision (1, 2, …), shown as "cut plan 2 of R3" instead of
-- the global id. Existing plans are numbered in the order they were saved (their ids).
ALTER TABLE `cut_plans` ADD `number` int NOT NULL DEFAULT 0;--> statement-breakpoint
UPDATE `cut_plans` AS `p` JOIN (SELECT `id`, ROW_NUMBER() OVER (PARTITION BY `revision_id` ORDER BY `id`) AS `n` FROM `cut_plans`) AS `o` ON `o`.`id` = `p`.`id` SET `p`.`number` = `o`.`n`;--> statement-breakpoint
ALTER TABLE `cut_plans` ALTER COLUMN `number` DROP DEFAULT;--> statement-breakpoint
ALTER TABLE `cut_plans` ADD CONSTRAINT `cut_plans_revision_number` UNIQUE(`revision_id`,`number`);
