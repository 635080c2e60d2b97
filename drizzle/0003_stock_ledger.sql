CREATE TABLE `items` (
	`id` int AUTO_INCREMENT NOT NULL,
	`sku` varchar(40) NOT NULL,
	`name` varchar(160) NOT NULL,
	`kind` enum('wire','magnet','part') NOT NULL,
	`unit` enum('kg','pcs','m') NOT NULL,
	`size_or_grade` varchar(80) NOT NULL DEFAULT '',
	`reorder_point` decimal(14,3) NOT NULL DEFAULT '0',
	`reorder_quantity` decimal(14,3) NOT NULL DEFAULT '0',
	`preferred_supplier_id` int,
	`active` boolean NOT NULL DEFAULT true,
	`on_hand` decimal(14,3) NOT NULL DEFAULT '0',
	`reserved` decimal(14,3) NOT NULL DEFAULT '0',
	`average_cost` decimal(14,4) NOT NULL DEFAULT '0',
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `items_id` PRIMARY KEY(`id`),
	CONSTRAINT `items_sku_unique` UNIQUE(`sku`),
	CONSTRAINT `items_on_hand_not_negative` CHECK(`items`.`on_hand` >= 0),
	CONSTRAINT `items_reserved_not_negative` CHECK(`items`.`reserved` >= 0)
);
--> statement-breakpoint
CREATE TABLE `locations` (
	`id` int AUTO_INCREMENT NOT NULL,
	`code` varchar(20) NOT NULL,
	`name` varchar(80) NOT NULL,
	`kind` enum('store','bin') NOT NULL,
	`parent_id` int,
	`active` boolean NOT NULL DEFAULT true,
	CONSTRAINT `locations_id` PRIMARY KEY(`id`),
	CONSTRAINT `locations_code_unique` UNIQUE(`code`)
);
--> statement-breakpoint
CREATE TABLE `lots` (
	`id` int AUTO_INCREMENT NOT NULL,
	`item_id` int NOT NULL,
	`lot_number` varchar(40) NOT NULL,
	`supplier_batch` varchar(60),
	`spool_type` varchar(40),
	`tare_kg` decimal(14,3),
	`received_on` date,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `lots_id` PRIMARY KEY(`id`),
	CONSTRAINT `lots_item_number_unique` UNIQUE(`item_id`,`lot_number`)
);
--> statement-breakpoint
CREATE TABLE `magnet_items` (
	`item_id` int NOT NULL,
	`grade_key` varchar(40) NOT NULL,
	`shape` enum('block','arc','disc','ring') NOT NULL,
	`dimensions_mm` varchar(200) NOT NULL,
	`coating` varchar(40) NOT NULL,
	`magnetisation` varchar(60) NOT NULL,
	CONSTRAINT `magnet_items_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
CREATE TABLE `stock_balances` (
	`item_id` int NOT NULL,
	`lot_id` int NOT NULL DEFAULT 0,
	`location_id` int NOT NULL,
	`on_hand` decimal(14,3) NOT NULL DEFAULT '0',
	`reserved` decimal(14,3) NOT NULL DEFAULT '0',
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `stock_balances_item_id_lot_id_location_id_pk` PRIMARY KEY(`item_id`,`lot_id`,`location_id`),
	CONSTRAINT `balances_on_hand_not_negative` CHECK(`stock_balances`.`on_hand` >= 0),
	CONSTRAINT `balances_reserved_not_negative` CHECK(`stock_balances`.`reserved` >= 0)
);
--> statement-breakpoint
CREATE TABLE `stock_movements` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`type` enum('receipt','issue','return','transfer','adjustment','count','scrap') NOT NULL,
	`item_id` int NOT NULL,
	`lot_id` int NOT NULL DEFAULT 0,
	`location_id` int NOT NULL,
	`quantity` decimal(14,3) NOT NULL,
	`unit_cost` decimal(14,4),
	`average_cost_after` decimal(14,4) NOT NULL,
	`item_on_hand_after` decimal(14,3) NOT NULL,
	`transfer_id` bigint,
	`counted_quantity` decimal(14,3),
	`gross_kg` decimal(14,3),
	`reference` varchar(80),
	`note` varchar(500),
	`reverses_movement_id` bigint,
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `stock_movements_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `wire_items` (
	`item_id` int NOT NULL,
	`conductor` varchar(20) NOT NULL,
	`standard` enum('AWG','IEC') NOT NULL,
	`size_label` varchar(12) NOT NULL,
	`insulation` varchar(12),
	`thermal_class` smallint NOT NULL,
	`enamel` varchar(40) NOT NULL,
	CONSTRAINT `wire_items_item_id` PRIMARY KEY(`item_id`)
);
--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `magnet_items` ADD CONSTRAINT `magnet_items_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_balances` ADD CONSTRAINT `stock_balances_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_balances` ADD CONSTRAINT `stock_balances_location_id_locations_id_fk` FOREIGN KEY (`location_id`) REFERENCES `locations`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_movements` ADD CONSTRAINT `stock_movements_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_movements` ADD CONSTRAINT `stock_movements_location_id_locations_id_fk` FOREIGN KEY (`location_id`) REFERENCES `locations`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stock_movements` ADD CONSTRAINT `stock_movements_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `wire_items` ADD CONSTRAINT `wire_items_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `items_name_idx` ON `items` (`name`);--> statement-breakpoint
CREATE INDEX `items_kind_idx` ON `items` (`kind`,`sku`);--> statement-breakpoint
CREATE INDEX `items_active_idx` ON `items` (`active`,`sku`);--> statement-breakpoint
CREATE INDEX `balances_location_idx` ON `stock_balances` (`location_id`,`item_id`);--> statement-breakpoint
CREATE INDEX `movements_item_time_idx` ON `stock_movements` (`item_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `movements_time_idx` ON `stock_movements` (`created_at`);--> statement-breakpoint
CREATE INDEX `movements_type_time_idx` ON `stock_movements` (`type`,`created_at`);--> statement-breakpoint
CREATE INDEX `movements_user_time_idx` ON `stock_movements` (`user_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `movements_lot_idx` ON `stock_movements` (`lot_id`);--> statement-breakpoint
CREATE INDEX `movements_reference_idx` ON `stock_movements` (`reference`);