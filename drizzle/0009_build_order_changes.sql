CREATE TABLE `build_order_issues` (
	`movement_id` bigint NOT NULL,
	`line_id` int NOT NULL,
	`quantity` decimal(14,3) NOT NULL,
	`unit_cost` decimal(14,4) NOT NULL,
	CONSTRAINT `build_order_issues_movement_id` PRIMARY KEY(`movement_id`),
	CONSTRAINT `build_order_issues_positive` CHECK(`build_order_issues`.`quantity` > 0)
);
--> statement-breakpoint
ALTER TABLE `build_order_lines` ADD CONSTRAINT `build_order_lines_order_item_unique` UNIQUE(`order_id`,`item_id`);--> statement-breakpoint
DROP INDEX `build_order_lines_order_idx` ON `build_order_lines`;--> statement-breakpoint
ALTER TABLE `build_order_issues` ADD CONSTRAINT `build_order_issues_movement_id_stock_movements_id_fk` FOREIGN KEY (`movement_id`) REFERENCES `stock_movements`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `build_order_issues` ADD CONSTRAINT `build_order_issues_line_id_build_order_lines_id_fk` FOREIGN KEY (`line_id`) REFERENCES `build_order_lines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `build_order_issues_line_idx` ON `build_order_issues` (`line_id`);