-- Edited by hand: the binary collation (not expressible in the Drizzle schema) makes LIKE on the lower-cased text fast.
ALTER TABLE `items` ADD `search_text` varchar(300) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin GENERATED ALWAYS AS (LOWER(CONCAT_WS(' ', sku, name, size_or_grade))) STORED;--> statement-breakpoint
CREATE INDEX `items_kind_value_idx` ON `items` (`active`,`kind`,`stock_value`);--> statement-breakpoint
CREATE INDEX `items_search_idx` ON `items` (`active`,`search_text`);