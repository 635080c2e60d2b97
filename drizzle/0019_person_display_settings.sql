ALTER TABLE `users` ADD `locale` varchar(8);--> statement-breakpoint
ALTER TABLE `users` ADD `time_zone` varchar(64);