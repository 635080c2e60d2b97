ALTER TABLE `items` ADD `available` decimal(14,3) GENERATED ALWAYS AS (on_hand - reserved) STORED;--> statement-breakpoint
ALTER TABLE `items` ADD `stock_value` decimal(20,4) GENERATED ALWAYS AS (on_hand * average_cost) STORED;--> statement-breakpoint
ALTER TABLE `items` ADD `below_reorder` boolean GENERATED ALWAYS AS (reorder_point > 0 AND on_hand - reserved < reorder_point) STORED;--> statement-breakpoint
CREATE INDEX `items_value_idx` ON `items` (`active`,`stock_value`);--> statement-breakpoint
CREATE INDEX `items_available_idx` ON `items` (`active`,`available`);--> statement-breakpoint
CREATE INDEX `items_below_reorder_idx` ON `items` (`active`,`below_reorder`,`sku`);--> statement-breakpoint
CREATE INDEX `items_on_hand_idx` ON `items` (`active`,`on_hand`);