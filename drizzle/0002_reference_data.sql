CREATE TABLE `conductor_materials` (
	`material_key` varchar(20) NOT NULL,
	`name` varchar(80) NOT NULL,
	`resistivity_20_ohm_mm2_per_m` decimal(12,9) NOT NULL,
	`temperature_coefficient_20_per_k` decimal(10,7) NOT NULL,
	`density_g_per_cm3` decimal(8,4) NOT NULL,
	`source` varchar(500) NOT NULL,
	CONSTRAINT `conductor_materials_material_key` PRIMARY KEY(`material_key`)
);
--> statement-breakpoint
CREATE TABLE `insulation_kinds` (
	`insulation_key` varchar(12) NOT NULL,
	`standard` enum('AWG','IEC') NOT NULL,
	`name` varchar(80) NOT NULL,
	`source` varchar(500) NOT NULL,
	CONSTRAINT `insulation_kinds_insulation_key` PRIMARY KEY(`insulation_key`)
);
--> statement-breakpoint
CREATE TABLE `magnet_grades` (
	`grade_key` varchar(40) NOT NULL,
	`name` varchar(40) NOT NULL,
	`aliases` varchar(120) NOT NULL DEFAULT '',
	`material` enum('sintered-ndfeb','smco5','sm2co17','hard-ferrite','bonded-ndfeb') NOT NULL,
	`temperature_suffix` varchar(3),
	`br_min_t` decimal(6,4) NOT NULL,
	`br_max_t` decimal(6,4) NOT NULL,
	`hcb_min_ka_per_m` decimal(8,1) NOT NULL,
	`hcj_min_ka_per_m` decimal(8,1) NOT NULL,
	`bh_max_min_kj_per_m3` decimal(7,1) NOT NULL,
	`bh_max_max_kj_per_m3` decimal(7,1) NOT NULL,
	`max_working_temperature_c` smallint NOT NULL,
	`br_temperature_coefficient_per_k` decimal(9,6) NOT NULL,
	`density_g_per_cm3` decimal(6,3) NOT NULL,
	`recoil_permeability` decimal(5,3) NOT NULL,
	`coercivity_falls_when_cold` boolean NOT NULL DEFAULT false,
	`source` varchar(500) NOT NULL,
	`built_in` boolean NOT NULL DEFAULT false,
	`added_by` varchar(40),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `magnet_grades_grade_key` PRIMARY KEY(`grade_key`),
	CONSTRAINT `magnet_grades_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `published_overall_diameters` (
	`id` int AUTO_INCREMENT NOT NULL,
	`standard` enum('AWG','IEC') NOT NULL,
	`size_label` varchar(12) NOT NULL,
	`insulation_key` varchar(12) NOT NULL,
	`max_overall_diameter_mm` decimal(10,4) NOT NULL,
	`source` varchar(500) NOT NULL,
	CONSTRAINT `published_overall_diameters_id` PRIMARY KEY(`id`),
	CONSTRAINT `published_overall_unique` UNIQUE(`standard`,`size_label`,`insulation_key`)
);
--> statement-breakpoint
CREATE TABLE `thermal_classes` (
	`class_c` smallint NOT NULL,
	`letter` varchar(2) NOT NULL,
	`typical_enamels` varchar(200) NOT NULL,
	`source` varchar(500) NOT NULL,
	CONSTRAINT `thermal_classes_class_c` PRIMARY KEY(`class_c`)
);
--> statement-breakpoint
CREATE TABLE `wire_sizes` (
	`id` int AUTO_INCREMENT NOT NULL,
	`standard` enum('AWG','IEC') NOT NULL,
	`label` varchar(12) NOT NULL,
	`gauge_number` smallint,
	`series` varchar(4),
	`bare_diameter_mm` decimal(10,6) NOT NULL,
	`source` varchar(500) NOT NULL,
	CONSTRAINT `wire_sizes_id` PRIMARY KEY(`id`),
	CONSTRAINT `wire_sizes_standard_label_unique` UNIQUE(`standard`,`label`)
);
--> statement-breakpoint
ALTER TABLE `magnet_grades` ADD CONSTRAINT `magnet_grades_added_by_users_id_fk` FOREIGN KEY (`added_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `magnet_grades_material_idx` ON `magnet_grades` (`material`,`br_max_t`);--> statement-breakpoint
CREATE INDEX `wire_sizes_diameter_idx` ON `wire_sizes` (`standard`,`bare_diameter_mm`);