CREATE TABLE `item_counts` (
	`active` boolean NOT NULL,
	`kind` enum('wire','magnet','part') NOT NULL,
	`below_reorder` boolean NOT NULL,
	`items` int NOT NULL DEFAULT 0,
	CONSTRAINT `item_counts_pk` PRIMARY KEY(`active`,`kind`,`below_reorder`)
);
