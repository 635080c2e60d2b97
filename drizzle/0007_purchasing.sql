CREATE TABLE `currency_rates` (
	`id` int AUTO_INCREMENT NOT NULL,
	`currency` varchar(3) NOT NULL,
	`rate` decimal(16,6) NOT NULL,
	`valid_from` date NOT NULL,
	`user_id` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `currency_rates_id` PRIMARY KEY(`id`),
	CONSTRAINT `currency_rates_unique` UNIQUE(`currency`,`valid_from`)
);
--> statement-breakpoint
CREATE TABLE `metal_base_prices` (
	`id` int AUTO_INCREMENT NOT NULL,
	`conductor` varchar(20) NOT NULL,
	`currency` varchar(3) NOT NULL,
	`price_per_kg` decimal(14,4) NOT NULL,
	`valid_from` date NOT NULL,
	`user_id` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `metal_base_prices_id` PRIMARY KEY(`id`),
	CONSTRAINT `metal_base_unique` UNIQUE(`conductor`,`currency`,`valid_from`)
);
--> statement-breakpoint
CREATE TABLE `price_imports` (
	`id` int AUTO_INCREMENT NOT NULL,
	`supplier_id` int NOT NULL,
	`file_name` varchar(200) NOT NULL,
	`file_sha256` varchar(64) NOT NULL,
	`row_count` int NOT NULL,
	`created_items` int NOT NULL DEFAULT 0,
	`mapping` text NOT NULL,
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `price_imports_id` PRIMARY KEY(`id`),
	CONSTRAINT `price_imports_file_unique` UNIQUE(`supplier_id`,`file_sha256`)
);
--> statement-breakpoint
CREATE TABLE `price_lines` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`supplier_id` int NOT NULL,
	`item_id` int NOT NULL,
	`supplier_sku` varchar(60) NOT NULL,
	`currency` varchar(3) NOT NULL,
	`unit_price` decimal(14,4),
	`adder_per_kg` decimal(14,4),
	`conductor` varchar(20),
	`min_quantity` decimal(14,3) NOT NULL,
	`valid_from` date NOT NULL,
	`import_id` int,
	`line` int,
	CONSTRAINT `price_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `price_lines_break_unique` UNIQUE(`supplier_id`,`supplier_sku`,`min_quantity`,`valid_from`)
);
--> statement-breakpoint
CREATE TABLE `settings` (
	`setting_key` varchar(60) NOT NULL,
	`value` varchar(500) NOT NULL,
	CONSTRAINT `settings_setting_key` PRIMARY KEY(`setting_key`)
);
--> statement-breakpoint
CREATE TABLE `supplier_items` (
	`id` int AUTO_INCREMENT NOT NULL,
	`supplier_id` int NOT NULL,
	`supplier_sku` varchar(60) NOT NULL,
	`item_id` int NOT NULL,
	CONSTRAINT `supplier_items_id` PRIMARY KEY(`id`),
	CONSTRAINT `supplier_items_sku_unique` UNIQUE(`supplier_id`,`supplier_sku`)
);
--> statement-breakpoint
CREATE TABLE `supplier_mappings` (
	`supplier_id` int NOT NULL,
	`header_signature` text NOT NULL,
	`mapping` text NOT NULL,
	CONSTRAINT `supplier_mappings_supplier_id` PRIMARY KEY(`supplier_id`)
);
--> statement-breakpoint
CREATE TABLE `suppliers` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`email` varchar(254),
	`currency` varchar(3) NOT NULL,
	`lead_time_days` smallint,
	`notes` varchar(1000),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `suppliers_id` PRIMARY KEY(`id`),
	CONSTRAINT `suppliers_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
ALTER TABLE `currency_rates` ADD CONSTRAINT `currency_rates_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `metal_base_prices` ADD CONSTRAINT `metal_base_prices_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `price_imports` ADD CONSTRAINT `price_imports_supplier_id_suppliers_id_fk` FOREIGN KEY (`supplier_id`) REFERENCES `suppliers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `price_imports` ADD CONSTRAINT `price_imports_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `price_lines` ADD CONSTRAINT `price_lines_supplier_id_suppliers_id_fk` FOREIGN KEY (`supplier_id`) REFERENCES `suppliers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `price_lines` ADD CONSTRAINT `price_lines_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `price_lines` ADD CONSTRAINT `price_lines_import_id_price_imports_id_fk` FOREIGN KEY (`import_id`) REFERENCES `price_imports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `supplier_items` ADD CONSTRAINT `supplier_items_supplier_id_suppliers_id_fk` FOREIGN KEY (`supplier_id`) REFERENCES `suppliers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `supplier_items` ADD CONSTRAINT `supplier_items_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `supplier_mappings` ADD CONSTRAINT `supplier_mappings_supplier_id_suppliers_id_fk` FOREIGN KEY (`supplier_id`) REFERENCES `suppliers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `price_imports_time_idx` ON `price_imports` (`created_at`);--> statement-breakpoint
CREATE INDEX `price_lines_item_idx` ON `price_lines` (`item_id`,`valid_from`);--> statement-breakpoint
CREATE INDEX `supplier_items_item_idx` ON `supplier_items` (`item_id`);