ALTER TABLE `probe_calibrations` ADD `certificate` varchar(120);--> statement-breakpoint
ALTER TABLE `probe_calibrations` ADD `feed_mm_per_min` double;