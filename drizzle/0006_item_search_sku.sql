DROP INDEX `items_search_idx` ON `items`;--> statement-breakpoint
CREATE INDEX `items_search_idx` ON `items` (`active`,`search_text`,`sku`);