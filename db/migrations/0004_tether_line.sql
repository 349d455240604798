PRAGMA foreign_keys=OFF;--> statement-breakpoint
CREATE TABLE `__new_setup_flags` (
	`setup_id` text NOT NULL,
	`code` text NOT NULL,
	`level` text NOT NULL,
	PRIMARY KEY(`setup_id`, `code`, `level`),
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "setup_flags_code_check" CHECK(code in ('free-lift', 'trim-calm', 'trim-unstable', 'trim-wind', 'trim-gust', 'tether-angle-wind', 'tether-angle-gust', 'mount-off-rail', 'thread-mismatch', 'adapter-mismatch', 'mount-rated-load', 'thread-capacity', 'safety-line', 'clearance-hull', 'clearance-tether', 'tether-length', 'tether-strength', 'tether-on-ground', 'helium-top-up', 'moored-balloon-rules', 'tether-height')),
	CONSTRAINT "setup_flags_level_check" CHECK(level in ('ok', 'caution', 'stop'))
);
--> statement-breakpoint
INSERT INTO `__new_setup_flags`("setup_id", "code", "level") SELECT "setup_id", "code", "level" FROM `setup_flags`;--> statement-breakpoint
DROP TABLE `setup_flags`;--> statement-breakpoint
ALTER TABLE `__new_setup_flags` RENAME TO `setup_flags`;--> statement-breakpoint
PRAGMA foreign_keys=ON;--> statement-breakpoint
CREATE INDEX `setup_flags_code_idx` ON `setup_flags` (`code`,`level`,`setup_id`);--> statement-breakpoint
ALTER TABLE `setups` ADD `wind_measured_at_m` real DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `wind_shear_exponent` real DEFAULT 0.14285714285714285 NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `relative_humidity` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `tether_diameter_m` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `target_height_m` real;