CREATE TABLE `unit_lift_tests` (
	`id` text PRIMARY KEY NOT NULL,
	`unit_id` text NOT NULL,
	`measured_gross_lift_kg` real NOT NULL,
	`temperature_c` real NOT NULL,
	`pressure_pa` real,
	`altitude_m` real DEFAULT 0 NOT NULL,
	`purity` real DEFAULT 1 NOT NULL,
	`tested_on` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`unit_id`) REFERENCES `envelope_units`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `unit_lift_tests_unit_idx` ON `unit_lift_tests` (`unit_id`,`tested_on`,`created_at`);--> statement-breakpoint
DROP INDEX `setup_payloads_template_idx`;--> statement-breakpoint
CREATE INDEX `setup_payloads_adapter_idx` ON `setup_payloads` (`adapter_id`,`setup_id`);--> statement-breakpoint
CREATE INDEX `setup_payloads_template_idx` ON `setup_payloads` (`template_id`,`setup_id`);--> statement-breakpoint
ALTER TABLE `adapters` ADD `active` integer DEFAULT true NOT NULL;--> statement-breakpoint
ALTER TABLE `envelope_units` ADD `active` integer DEFAULT true NOT NULL;--> statement-breakpoint
CREATE INDEX `envelope_units_model_idx` ON `envelope_units` (`model_id`,`serial`);--> statement-breakpoint
ALTER TABLE `payload_templates` ADD `active` integer DEFAULT true NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `lift_check_free_lift_kg` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `lift_check_temperature_c` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `lift_check_weighed_with` text;--> statement-breakpoint
ALTER TABLE `setups` ADD `lift_check_solve_for` text;--> statement-breakpoint
CREATE INDEX `setups_model_idx` ON `setups` (`model_id`);--> statement-breakpoint
CREATE INDEX `setups_unit_idx` ON `setups` (`unit_id`);--> statement-breakpoint
CREATE INDEX `setups_mount_idx` ON `setups` (`mount_id`);--> statement-breakpoint
CREATE INDEX `envelope_models_name_idx` ON `envelope_models` (`name`,`id`);--> statement-breakpoint
CREATE INDEX `user_role_name_idx` ON `user` (`role`,`name`,`id`);--> statement-breakpoint
-- Backfill (written by hand): each unit's single weighing becomes its first lift test, at ISA
-- pressure for its altitude and pure helium, as the calibration read it before.
INSERT INTO `unit_lift_tests` (`id`, `unit_id`, `measured_gross_lift_kg`, `temperature_c`, `pressure_pa`, `altitude_m`, `purity`, `tested_on`, `notes`, `created_at`)
SELECT 'lt-' || `id` || '-first', `id`, `measured_gross_lift_kg`, `measured_at_temperature_c`, NULL, `measured_at_altitude_m`, 1, `measured_on`, 'first weighing, moved from the unit''s own record', `created_at`
FROM `envelope_units`
WHERE NOT EXISTS (SELECT 1 FROM `unit_lift_tests` WHERE `unit_lift_tests`.`unit_id` = `envelope_units`.`id`);
