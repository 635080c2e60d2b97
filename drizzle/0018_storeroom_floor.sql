CREATE TABLE `document_contents` (
	`sha256` char(64) NOT NULL,
	`size_bytes` int NOT NULL,
	`content` mediumblob NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `document_contents_sha256` PRIMARY KEY(`sha256`)
);
--> statement-breakpoint
CREATE TABLE `lot_documents` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lot_id` int NOT NULL,
	`file_name` varchar(160) NOT NULL,
	`content_type` varchar(60) NOT NULL,
	`size_bytes` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`title` varchar(120) NOT NULL DEFAULT '',
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `lot_documents_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `lot_hold_events` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`lot_id` int NOT NULL,
	`action` enum('hold','release') NOT NULL,
	`reason` varchar(300) NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `lot_hold_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `stocktake_lines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`stocktake_id` int NOT NULL,
	`item_id` int NOT NULL,
	`lot_id` int NOT NULL DEFAULT 0,
	`location_id` int NOT NULL,
	`book_at_start` decimal(14,3) NOT NULL,
	`counted` decimal(14,3),
	`book_at_count` decimal(14,3),
	`gross_kg` decimal(14,3),
	`tare_kg` decimal(14,3),
	`counted_by` varchar(40),
	`counted_at` datetime(3),
	`recount_requested` boolean NOT NULL DEFAULT false,
	`added_during_count` boolean NOT NULL DEFAULT false,
	`movement_id` bigint,
	CONSTRAINT `stocktake_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `stocktake_lines_unique` UNIQUE(`stocktake_id`,`item_id`,`lot_id`,`location_id`)
);
--> statement-breakpoint
CREATE TABLE `stocktake_locations` (
	`stocktake_id` int NOT NULL,
	`location_id` int NOT NULL,
	CONSTRAINT `stocktake_locations_stocktake_id_location_id_pk` PRIMARY KEY(`stocktake_id`,`location_id`)
);
--> statement-breakpoint
CREATE TABLE `stocktakes` (
	`id` int AUTO_INCREMENT NOT NULL,
	`status` enum('counting','approved','cancelled') NOT NULL DEFAULT 'counting',
	`note` varchar(300) NOT NULL DEFAULT '',
	`started_by` varchar(40) NOT NULL,
	`started_at` datetime(3) NOT NULL,
	`approved_by` varchar(40),
	`approved_at` datetime(3),
	`closed_at` datetime(3),
	CONSTRAINT `stocktakes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `items` ADD `held` decimal(14,3) DEFAULT '0' NOT NULL AFTER `reserved`;--> statement-breakpoint
ALTER TABLE `items` MODIFY `available` decimal(14,3) GENERATED ALWAYS AS (on_hand - reserved - held) STORED;--> statement-breakpoint
ALTER TABLE `items` MODIFY `below_reorder` boolean GENERATED ALWAYS AS (reorder_point > 0 AND on_hand - reserved - held < reorder_point) STORED;--> statement-breakpoint
ALTER TABLE `locations` ADD `last_counted_on` date;--> statement-breakpoint
ALTER TABLE `lots` ADD `supplier_id` int;--> statement-breakpoint
ALTER TABLE `lots` ADD `purchase_order_id` int;--> statement-breakpoint
ALTER TABLE `lots` ADD `receipt_movement_id` bigint;--> statement-breakpoint
ALTER TABLE `lots` ADD `hold_reason` varchar(300);--> statement-breakpoint
ALTER TABLE `lots` ADD `held_at` datetime(3);--> statement-breakpoint
ALTER TABLE `lots` ADD `held_by` varchar(40);--> statement-breakpoint
ALTER TABLE `lot_documents` ADD CONSTRAINT `lot_documents_lot_id_lots_id_fk` FOREIGN KEY (`lot_id`) REFERENCES `lots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lot_documents` ADD CONSTRAINT `lot_documents_sha256_document_contents_sha256_fk` FOREIGN KEY (`sha256`) REFERENCES `document_contents`(`sha256`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lot_documents` ADD CONSTRAINT `lot_documents_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lot_hold_events` ADD CONSTRAINT `lot_hold_events_lot_id_lots_id_fk` FOREIGN KEY (`lot_id`) REFERENCES `lots`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lot_hold_events` ADD CONSTRAINT `lot_hold_events_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_lines` ADD CONSTRAINT `stocktake_lines_stocktake_id_stocktakes_id_fk` FOREIGN KEY (`stocktake_id`) REFERENCES `stocktakes`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_lines` ADD CONSTRAINT `stocktake_lines_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_lines` ADD CONSTRAINT `stocktake_lines_location_id_locations_id_fk` FOREIGN KEY (`location_id`) REFERENCES `locations`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_lines` ADD CONSTRAINT `stocktake_lines_counted_by_users_id_fk` FOREIGN KEY (`counted_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_locations` ADD CONSTRAINT `stocktake_locations_stocktake_id_stocktakes_id_fk` FOREIGN KEY (`stocktake_id`) REFERENCES `stocktakes`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktake_locations` ADD CONSTRAINT `stocktake_locations_location_id_locations_id_fk` FOREIGN KEY (`location_id`) REFERENCES `locations`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktakes` ADD CONSTRAINT `stocktakes_started_by_users_id_fk` FOREIGN KEY (`started_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stocktakes` ADD CONSTRAINT `stocktakes_approved_by_users_id_fk` FOREIGN KEY (`approved_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `lot_documents_lot_idx` ON `lot_documents` (`lot_id`,`id`);--> statement-breakpoint
CREATE INDEX `lot_hold_events_lot_idx` ON `lot_hold_events` (`lot_id`,`id`);--> statement-breakpoint
CREATE INDEX `stocktake_lines_order_idx` ON `stocktake_lines` (`stocktake_id`,`location_id`,`id`);--> statement-breakpoint
CREATE INDEX `stocktake_locations_location_idx` ON `stocktake_locations` (`location_id`);--> statement-breakpoint
CREATE INDEX `stocktakes_status_idx` ON `stocktakes` (`status`,`id`);--> statement-breakpoint
ALTER TABLE `items` ADD CONSTRAINT `items_held_not_negative` CHECK (`items`.`held` >= 0);--> statement-breakpoint
CREATE INDEX `lots_number_idx` ON `lots` (`lot_number`);--> statement-breakpoint
CREATE INDEX `lots_supplier_idx` ON `lots` (`supplier_id`,`id`);--> statement-breakpoint
CREATE INDEX `lots_held_idx` ON `lots` (`held_at`);