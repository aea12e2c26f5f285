ALTER TABLE `corrections` ADD `details` json;--> statement-breakpoint
ALTER TABLE `measurements` ADD `source_line` int;--> statement-breakpoint
ALTER TABLE `measurements` ADD `axes` json;