-- Edited by hand: the gram's binary collation (not expressible in the Drizzle schema) compares
-- grams as search_text's LIKE does; the triggers and the backfill below are written by hand.
CREATE TABLE `item_search_grams` (
	`gram` varchar(3) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
	`sku` varchar(40) NOT NULL,
	`item_id` int NOT NULL,
	`active` boolean NOT NULL,
	CONSTRAINT `item_search_grams_pk` PRIMARY KEY(`gram`,`sku`)
);
--> statement-breakpoint
CREATE INDEX `item_search_grams_item_idx` ON `item_search_grams` (`item_id`);
--> statement-breakpoint
-- item_search_grams is kept by these triggers (decision 057-trigram-search): in the same
-- transaction as the item's own change. An item has one posting per distinct three-character
-- piece of its search_text (characters, not bytes: SUBSTRING counts characters). A change of
-- search_text or sku writes the item's postings anew; a change of active only marks them;
-- any other change (a movement's on_hand) touches nothing.
CREATE TRIGGER `items_search_grams_insert` AFTER INSERT ON `items` FOR EACH ROW
  INSERT INTO `item_search_grams` (`gram`, `sku`, `item_id`, `active`)
  WITH RECURSIVE `positions` (`position`) AS (
    SELECT 1 UNION ALL SELECT `position` + 1 FROM `positions` WHERE `position` < CHAR_LENGTH(NEW.`search_text`) - 2
  )
  SELECT DISTINCT SUBSTRING(NEW.`search_text`, `position`, 3), NEW.`sku`, NEW.`id`, NEW.`active`
  FROM `positions` WHERE CHAR_LENGTH(NEW.`search_text`) >= 3;
--> statement-breakpoint
CREATE TRIGGER `items_search_grams_update` AFTER UPDATE ON `items` FOR EACH ROW
BEGIN
  IF NOT (OLD.`search_text` <=> NEW.`search_text` AND OLD.`sku` <=> NEW.`sku` AND OLD.`id` <=> NEW.`id`) THEN
    DELETE FROM `item_search_grams` WHERE `item_id` = OLD.`id`;
    INSERT INTO `item_search_grams` (`gram`, `sku`, `item_id`, `active`)
    WITH RECURSIVE `positions` (`position`) AS (
      SELECT 1 UNION ALL SELECT `position` + 1 FROM `positions` WHERE `position` < CHAR_LENGTH(NEW.`search_text`) - 2
    )
    SELECT DISTINCT SUBSTRING(NEW.`search_text`, `position`, 3), NEW.`sku`, NEW.`id`, NEW.`active`
    FROM `positions` WHERE CHAR_LENGTH(NEW.`search_text`) >= 3;
  ELSEIF NOT (OLD.`active` <=> NEW.`active`) THEN
    UPDATE `item_search_grams` SET `active` = NEW.`active` WHERE `item_id` = NEW.`id`;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `items_search_grams_delete` AFTER DELETE ON `items` FOR EACH ROW
  DELETE FROM `item_search_grams` WHERE `item_id` = OLD.`id`;
--> statement-breakpoint
-- The items already there, in one statement (the same statement a repair runs after emptying
-- the table). 298 = search_text's 300 characters less two.
INSERT INTO `item_search_grams` (`gram`, `sku`, `item_id`, `active`)
  WITH RECURSIVE `positions` (`position`) AS (
    SELECT 1 UNION ALL SELECT `position` + 1 FROM `positions` WHERE `position` < 298
  )
  SELECT DISTINCT SUBSTRING(`items`.`search_text`, `positions`.`position`, 3), `items`.`sku`, `items`.`id`, `items`.`active`
  FROM `items` JOIN `positions` ON `positions`.`position` <= CHAR_LENGTH(`items`.`search_text`) - 2;
