ALTER TABLE `magnet_grades` ADD `hcj_temperature_coefficient_per_k` decimal(9,6);--> statement-breakpoint
ALTER TABLE `magnet_grades` ADD `curie_temperature_c` smallint;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `slot_liner_area_mm2` decimal(10,2);--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `phases` smallint DEFAULT 3 NOT NULL;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `winding_layers` smallint DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `phase_connection` enum('star','delta') DEFAULT 'star' NOT NULL;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `parallel_paths` smallint DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD `rated_speed_rpm` decimal(10,1);--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_phases_positive` CHECK (`design_revisions`.`phases` > 0);--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_layers_valid` CHECK (`design_revisions`.`winding_layers` IN (1, 2));--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_parallel_paths_positive` CHECK (`design_revisions`.`parallel_paths` > 0);