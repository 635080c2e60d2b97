-- item_counts is kept by these triggers (decision 050-kept-item-counts): in the same transaction
-- as the item's own change, and only when active, kind or below_reorder change. Two rows change
-- in key order, so two transactions moving items across the same keys never wait on each other
-- in opposite orders.
CREATE TRIGGER `items_count_insert` AFTER INSERT ON `items` FOR EACH ROW
  INSERT INTO `item_counts` (`active`, `kind`, `below_reorder`, `items`)
  VALUES (NEW.`active`, NEW.`kind`, NEW.`below_reorder`, 1)
  ON DUPLICATE KEY UPDATE `items` = `items` + 1;
--> statement-breakpoint
CREATE TRIGGER `items_count_update` AFTER UPDATE ON `items` FOR EACH ROW
BEGIN
  IF NOT (OLD.`active` <=> NEW.`active` AND OLD.`kind` <=> NEW.`kind` AND OLD.`below_reorder` <=> NEW.`below_reorder`) THEN
    IF (OLD.`active`, OLD.`kind` + 0, OLD.`below_reorder`) < (NEW.`active`, NEW.`kind` + 0, NEW.`below_reorder`) THEN
      INSERT INTO `item_counts` (`active`, `kind`, `below_reorder`, `items`)
      VALUES (OLD.`active`, OLD.`kind`, OLD.`below_reorder`, -1), (NEW.`active`, NEW.`kind`, NEW.`below_reorder`, 1)
      ON DUPLICATE KEY UPDATE `items` = `items` + VALUES(`items`);
    ELSE
      INSERT INTO `item_counts` (`active`, `kind`, `below_reorder`, `items`)
      VALUES (NEW.`active`, NEW.`kind`, NEW.`below_reorder`, 1), (OLD.`active`, OLD.`kind`, OLD.`below_reorder`, -1)
      ON DUPLICATE KEY UPDATE `items` = `items` + VALUES(`items`);
    END IF;
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER `items_count_delete` AFTER DELETE ON `items` FOR EACH ROW
  INSERT INTO `item_counts` (`active`, `kind`, `below_reorder`, `items`)
  VALUES (OLD.`active`, OLD.`kind`, OLD.`below_reorder`, -1)
  ON DUPLICATE KEY UPDATE `items` = `items` + VALUES(`items`);
--> statement-breakpoint
-- The items already there, counted once (the same statement a repair runs).
INSERT INTO `item_counts` (`active`, `kind`, `below_reorder`, `items`)
  SELECT `active`, `kind`, `below_reorder`, COUNT(*) FROM `items` GROUP BY `active`, `kind`, `below_reorder`
  ON DUPLICATE KEY UPDATE `items` = VALUES(`items`);
