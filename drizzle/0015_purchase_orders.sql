CREATE TABLE `purchase_order_events` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`order_id` int NOT NULL,
	`kind` varchar(30) NOT NULL,
	`detail` varchar(1000) NOT NULL DEFAULT '',
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `purchase_order_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `purchase_order_lines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`order_id` int NOT NULL,
	`line_number` smallint NOT NULL,
	`item_id` int NOT NULL,
	`supplier_sku` varchar(60) NOT NULL DEFAULT '',
	`quantity` decimal(14,3) NOT NULL,
	`unit_price` decimal(14,4) NOT NULL,
	`price_source` enum('price_list','override') NOT NULL,
	`override_reason` varchar(300),
	`metal_base_per_kg` decimal(14,4),
	`adder_per_kg` decimal(14,4),
	`metal_base_fixed_at` enum('order','delivery'),
	`requested_date` date,
	`lead_time_days` smallint NOT NULL DEFAULT 0,
	`expected_date` date NOT NULL,
	`received` decimal(14,3) NOT NULL DEFAULT '0',
	`completed_at` datetime(3),
	CONSTRAINT `purchase_order_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `purchase_order_lines_number_unique` UNIQUE(`order_id`,`line_number`),
	CONSTRAINT `purchase_order_lines_quantity` CHECK(`purchase_order_lines`.`quantity` > 0),
	CONSTRAINT `purchase_order_lines_received` CHECK(`purchase_order_lines`.`received` >= 0),
	CONSTRAINT `purchase_order_lines_price` CHECK(`purchase_order_lines`.`unit_price` >= 0)
);
--> statement-breakpoint
CREATE TABLE `purchase_orders` (
	`id` int AUTO_INCREMENT NOT NULL,
	`supplier_id` int NOT NULL,
	`status` enum('draft','sent','partly_received','received','cancelled','closed_short') NOT NULL DEFAULT 'draft',
	`currency` varchar(3) NOT NULL,
	`notes` varchar(1000) NOT NULL DEFAULT '',
	`ordered_on` date,
	`sent_at` datetime(3),
	`end_reason` varchar(500),
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `purchase_orders_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `purchase_receipt_lines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`receipt_id` int NOT NULL,
	`order_line_id` int NOT NULL,
	`movement_id` bigint NOT NULL,
	`quantity` decimal(14,3) NOT NULL,
	`unit_price` decimal(14,4) NOT NULL,
	`unit_cost` decimal(14,4) NOT NULL,
	`rate` decimal(16,6),
	CONSTRAINT `purchase_receipt_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `purchase_receipt_lines_movement_unique` UNIQUE(`movement_id`)
);
--> statement-breakpoint
CREATE TABLE `purchase_receipts` (
	`id` int AUTO_INCREMENT NOT NULL,
	`order_id` int NOT NULL,
	`received_on` date NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `purchase_receipts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `items` ADD `on_order` decimal(14,3) DEFAULT '0' NOT NULL;--> statement-breakpoint
ALTER TABLE `price_lines` ADD `lead_time_days` smallint;--> statement-breakpoint
ALTER TABLE `price_lines` ADD `pack_quantity` decimal(14,3);--> statement-breakpoint
ALTER TABLE `suppliers` ADD `order_email` varchar(254);--> statement-breakpoint
ALTER TABLE `suppliers` ADD `metal_base_fixed_at` enum('order','delivery') DEFAULT 'order' NOT NULL;--> statement-breakpoint
ALTER TABLE `suppliers` ADD `wire_tolerance_percent` decimal(5,2) DEFAULT '10' NOT NULL;--> statement-breakpoint
ALTER TABLE `suppliers` ADD `piece_tolerance_percent` decimal(5,2) DEFAULT '0' NOT NULL;--> statement-breakpoint
ALTER TABLE `build_orders` ADD `planned_start` date;--> statement-breakpoint
ALTER TABLE `stock_alerts` ADD `covered_by_order_id` int;--> statement-breakpoint
ALTER TABLE `purchase_order_events` ADD CONSTRAINT `purchase_order_events_order_id_purchase_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `purchase_orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_order_events` ADD CONSTRAINT `purchase_order_events_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_order_lines` ADD CONSTRAINT `purchase_order_lines_order_id_purchase_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `purchase_orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_order_lines` ADD CONSTRAINT `purchase_order_lines_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_orders` ADD CONSTRAINT `purchase_orders_supplier_id_suppliers_id_fk` FOREIGN KEY (`supplier_id`) REFERENCES `suppliers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_orders` ADD CONSTRAINT `purchase_orders_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_receipt_lines` ADD CONSTRAINT `purchase_receipt_lines_receipt_id_purchase_receipts_id_fk` FOREIGN KEY (`receipt_id`) REFERENCES `purchase_receipts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_receipt_lines` ADD CONSTRAINT `purchase_receipt_lines_order_line_id_purchase_order_lines_id_fk` FOREIGN KEY (`order_line_id`) REFERENCES `purchase_order_lines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_receipt_lines` ADD CONSTRAINT `purchase_receipt_lines_movement_id_stock_movements_id_fk` FOREIGN KEY (`movement_id`) REFERENCES `stock_movements`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_receipts` ADD CONSTRAINT `purchase_receipts_order_id_purchase_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `purchase_orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `purchase_receipts` ADD CONSTRAINT `purchase_receipts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `purchase_order_events_order_idx` ON `purchase_order_events` (`order_id`,`id`);--> statement-breakpoint
CREATE INDEX `purchase_order_lines_item_idx` ON `purchase_order_lines` (`item_id`,`expected_date`);--> statement-breakpoint
CREATE INDEX `purchase_order_lines_expected_idx` ON `purchase_order_lines` (`expected_date`);--> statement-breakpoint
CREATE INDEX `purchase_orders_status_idx` ON `purchase_orders` (`status`,`id`);--> statement-breakpoint
CREATE INDEX `purchase_orders_supplier_idx` ON `purchase_orders` (`supplier_id`,`id`);--> statement-breakpoint
CREATE INDEX `purchase_receipt_lines_receipt_idx` ON `purchase_receipt_lines` (`receipt_id`);--> statement-breakpoint
CREATE INDEX `purchase_receipt_lines_line_idx` ON `purchase_receipt_lines` (`order_line_id`);--> statement-breakpoint
CREATE INDEX `purchase_receipts_order_idx` ON `purchase_receipts` (`order_id`,`id`);--> statement-breakpoint
ALTER TABLE `items` ADD CONSTRAINT `items_on_order_not_negative` CHECK (`items`.`on_order` >= 0);