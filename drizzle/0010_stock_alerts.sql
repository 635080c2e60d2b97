CREATE TABLE `alert_preferences` (
	`user_id` varchar(40) NOT NULL,
	`mode` enum('each','digest','none') NOT NULL,
	CONSTRAINT `alert_preferences_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
CREATE TABLE `stock_alert_notices` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`alert_id` int NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`kind` enum('alert','digest') NOT NULL,
	`outbox_id` int,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `stock_alert_notices_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `stock_alerts` (
	`id` int AUTO_INCREMENT NOT NULL,
	`item_id` int NOT NULL,
	`available_at_open` decimal(14,3) NOT NULL,
	`reorder_point` decimal(14,3) NOT NULL,
	`reorder_quantity` decimal(14,3) NOT NULL,
	`opened_at` datetime(3) NOT NULL,
	`closed_at` datetime(3),
	`available_at_close` decimal(14,3),
	`open_item_id` int GENERATED ALWAYS AS (IF(closed_at IS NULL, item_id, NULL)) STORED,
	CONSTRAINT `stock_alerts_id` PRIMARY KEY(`id`),
	CONSTRAINT `stock_alerts_one_open` UNIQUE(`open_item_id`)
);
--> statement-breakpoint
ALTER TABLE `alert_preferences` ADD CONSTRAINT `alert_preferences_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_alert_notices` ADD CONSTRAINT `stock_alert_notices_alert_id_stock_alerts_id_fk` FOREIGN KEY (`alert_id`) REFERENCES `stock_alerts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_alert_notices` ADD CONSTRAINT `stock_alert_notices_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_alert_notices` ADD CONSTRAINT `stock_alert_notices_outbox_id_mail_outbox_id_fk` FOREIGN KEY (`outbox_id`) REFERENCES `mail_outbox`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_alerts` ADD CONSTRAINT `stock_alerts_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `stock_alert_notices_alert_idx` ON `stock_alert_notices` (`alert_id`);--> statement-breakpoint
CREATE INDEX `stock_alert_notices_user_idx` ON `stock_alert_notices` (`user_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `stock_alerts_item_idx` ON `stock_alerts` (`item_id`,`opened_at`);--> statement-breakpoint
CREATE INDEX `stock_alerts_opened_idx` ON `stock_alerts` (`opened_at`);--> statement-breakpoint
CREATE INDEX `stock_alerts_closed_idx` ON `stock_alerts` (`closed_at`,`opened_at`);