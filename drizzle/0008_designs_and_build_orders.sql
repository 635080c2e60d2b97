CREATE TABLE `design_lines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`revision_id` int NOT NULL,
	`position` smallint NOT NULL,
	`kind` enum('coil','magnet','part') NOT NULL,
	`item_id` int NOT NULL,
	`turns` int,
	`strands_in_hand` smallint,
	`active_length_mm` decimal(10,2),
	`end_turn_length_mm` decimal(10,2),
	`lead_length_mm` decimal(10,2),
	`coils_per_motor` smallint,
	`scrap_percent` decimal(5,2),
	`operating_temperature_c` decimal(6,1),
	`pieces_per_motor` int,
	`quantity_per_motor` decimal(14,3),
	CONSTRAINT `design_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `design_lines_position_unique` UNIQUE(`revision_id`,`position`),
	CONSTRAINT `design_lines_coil_complete` CHECK(`design_lines`.`kind` <> 'coil' OR (`design_lines`.`turns` > 0 AND `design_lines`.`strands_in_hand` > 0 AND `design_lines`.`active_length_mm` > 0 AND `design_lines`.`end_turn_length_mm` >= 0 AND `design_lines`.`lead_length_mm` >= 0 AND `design_lines`.`coils_per_motor` > 0 AND `design_lines`.`scrap_percent` >= 0 AND `design_lines`.`operating_temperature_c` IS NOT NULL)),
	CONSTRAINT `design_lines_magnet_complete` CHECK(`design_lines`.`kind` <> 'magnet' OR `design_lines`.`pieces_per_motor` > 0),
	CONSTRAINT `design_lines_part_complete` CHECK(`design_lines`.`kind` <> 'part' OR `design_lines`.`quantity_per_motor` > 0)
);
--> statement-breakpoint
CREATE TABLE `design_revisions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`design_id` int NOT NULL,
	`revision` smallint NOT NULL,
	`status` enum('draft','released') NOT NULL DEFAULT 'draft',
	`poles` smallint NOT NULL,
	`slots` smallint NOT NULL,
	`rated_current_a` decimal(10,3) NOT NULL,
	`rated_torque_nm` decimal(12,4),
	`torque_basis` enum('measured','estimated') NOT NULL DEFAULT 'estimated',
	`insulation_class_c` smallint NOT NULL,
	`slot_area_mm2` decimal(10,2),
	`coil_sides_per_slot` smallint NOT NULL DEFAULT 2,
	`air_gap_radius_mm` decimal(10,3),
	`air_gap_flux_density_t` decimal(6,4),
	`pole_coverage` decimal(4,3),
	`notes` varchar(1000) NOT NULL DEFAULT '',
	`released_at` datetime(3),
	`released_by` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `design_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `design_revisions_unique` UNIQUE(`design_id`,`revision`),
	CONSTRAINT `design_revisions_poles_positive` CHECK(`design_revisions`.`poles` > 0),
	CONSTRAINT `design_revisions_slots_positive` CHECK(`design_revisions`.`slots` > 0)
);
--> statement-breakpoint
CREATE TABLE `designs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`description` varchar(1000) NOT NULL DEFAULT '',
	`motor_type` varchar(60) NOT NULL DEFAULT '',
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `designs_id` PRIMARY KEY(`id`),
	CONSTRAINT `designs_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `build_order_events` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`order_id` int NOT NULL,
	`from_status` enum('draft','reserved','in_progress','complete','cancelled'),
	`to_status` enum('draft','reserved','in_progress','complete','cancelled') NOT NULL,
	`note` varchar(500) NOT NULL DEFAULT '',
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `build_order_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `build_order_lines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`order_id` int NOT NULL,
	`item_id` int NOT NULL,
	`required` decimal(14,3) NOT NULL,
	`reserved` decimal(14,3) NOT NULL DEFAULT '0',
	`issued` decimal(14,3) NOT NULL DEFAULT '0',
	`planned_unit_cost` decimal(14,4),
	CONSTRAINT `build_order_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `build_order_lines_required` CHECK(`build_order_lines`.`required` > 0),
	CONSTRAINT `build_order_lines_reserved` CHECK(`build_order_lines`.`reserved` >= 0),
	CONSTRAINT `build_order_lines_issued` CHECK(`build_order_lines`.`issued` >= 0)
);
--> statement-breakpoint
CREATE TABLE `build_order_reservations` (
	`line_id` int NOT NULL,
	`item_id` int NOT NULL,
	`lot_id` int NOT NULL DEFAULT 0,
	`location_id` int NOT NULL,
	`quantity` decimal(14,3) NOT NULL,
	CONSTRAINT `build_order_reservations_line_id_item_id_lot_id_location_id_pk` PRIMARY KEY(`line_id`,`item_id`,`lot_id`,`location_id`),
	CONSTRAINT `build_order_reservations_positive` CHECK(`build_order_reservations`.`quantity` > 0)
);
--> statement-breakpoint
CREATE TABLE `build_orders` (
	`id` int AUTO_INCREMENT NOT NULL,
	`design_id` int NOT NULL,
	`revision_id` int NOT NULL,
	`quantity` int NOT NULL,
	`status` enum('draft','reserved','in_progress','complete','cancelled') NOT NULL DEFAULT 'draft',
	`note` varchar(500) NOT NULL DEFAULT '',
	`user_id` varchar(40) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `build_orders_id` PRIMARY KEY(`id`),
	CONSTRAINT `build_orders_quantity_positive` CHECK(`build_orders`.`quantity` > 0)
);
--> statement-breakpoint
ALTER TABLE `design_lines` ADD CONSTRAINT `design_lines_revision_id_design_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `design_revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `design_lines` ADD CONSTRAINT `design_lines_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_design_id_designs_id_fk` FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_released_by_users_id_fk` FOREIGN KEY (`released_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `designs` ADD CONSTRAINT `designs_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_events` ADD CONSTRAINT `build_order_events_order_id_build_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `build_orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_events` ADD CONSTRAINT `build_order_events_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_lines` ADD CONSTRAINT `build_order_lines_order_id_build_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `build_orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_lines` ADD CONSTRAINT `build_order_lines_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_reservations` ADD CONSTRAINT `build_order_reservations_line_id_build_order_lines_id_fk` FOREIGN KEY (`line_id`) REFERENCES `build_order_lines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_reservations` ADD CONSTRAINT `build_order_reservations_item_id_items_id_fk` FOREIGN KEY (`item_id`) REFERENCES `items`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_reservations` ADD CONSTRAINT `build_order_reservations_location_id_locations_id_fk` FOREIGN KEY (`location_id`) REFERENCES `locations`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_orders` ADD CONSTRAINT `build_orders_design_id_designs_id_fk` FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_orders` ADD CONSTRAINT `build_orders_revision_id_design_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `design_revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_orders` ADD CONSTRAINT `build_orders_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `design_lines_item_idx` ON `design_lines` (`item_id`);--> statement-breakpoint
CREATE INDEX `design_revisions_status_idx` ON `design_revisions` (`status`,`design_id`);--> statement-breakpoint
CREATE INDEX `build_order_events_order_idx` ON `build_order_events` (`order_id`);--> statement-breakpoint
CREATE INDEX `build_order_lines_order_idx` ON `build_order_lines` (`order_id`,`item_id`);--> statement-breakpoint
CREATE INDEX `build_order_lines_item_idx` ON `build_order_lines` (`item_id`);--> statement-breakpoint
CREATE INDEX `build_order_reservations_balance_idx` ON `build_order_reservations` (`item_id`,`lot_id`,`location_id`);--> statement-breakpoint
CREATE INDEX `build_orders_status_idx` ON `build_orders` (`status`,`id`);--> statement-breakpoint
CREATE INDEX `build_orders_revision_idx` ON `build_orders` (`revision_id`);