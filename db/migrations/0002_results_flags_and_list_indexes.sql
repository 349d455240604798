CREATE TABLE `setup_flags` (
	`setup_id` text NOT NULL,
	`code` text NOT NULL,
	`level` text NOT NULL,
	PRIMARY KEY(`setup_id`, `code`, `level`),
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "setup_flags_code_check" CHECK(code in ('free-lift', 'trim-calm', 'trim-unstable', 'trim-wind', 'trim-gust', 'tether-angle-wind', 'tether-angle-gust', 'mount-off-rail', 'thread-mismatch', 'adapter-mismatch', 'mount-rated-load', 'thread-capacity', 'safety-line', 'clearance-hull', 'clearance-tether', 'tether-length', 'tether-strength', 'helium-top-up', 'moored-balloon-rules', 'tether-height')),
	CONSTRAINT "setup_flags_level_check" CHECK(level in ('ok', 'caution', 'stop'))
);
--> statement-breakpoint
CREATE INDEX `setup_flags_code_idx` ON `setup_flags` (`code`,`level`,`setup_id`);--> statement-breakpoint
CREATE TABLE `setup_results` (
	`setup_id` text PRIMARY KEY NOT NULL,
	`result_json` text NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
DROP INDEX `setups_owner_updated_idx`;--> statement-breakpoint
DROP INDEX `setups_status_submitted_idx`;--> statement-breakpoint
CREATE INDEX `setups_status_free_lift_idx` ON `setups` (`status`,`free_lift_ratio`,`id`);--> statement-breakpoint
CREATE INDEX `setups_status_payload_mass_idx` ON `setups` (`status`,`payload_mass_kg`,`id`);--> statement-breakpoint
CREATE INDEX `setups_status_worst_idx` ON `setups` (`status`,`worst_flag`,`submitted_at`,`id`);--> statement-breakpoint
CREATE INDEX `setups_status_model_idx` ON `setups` (`status`,`model_id`,`submitted_at`,`id`);--> statement-breakpoint
CREATE INDEX `setups_submitted_idx` ON `setups` (`submitted_at`,`id`);--> statement-breakpoint
CREATE INDEX `setups_created_idx` ON `setups` (`created_at`,`model_id`,`status`);--> statement-breakpoint
CREATE INDEX `setups_owner_updated_idx` ON `setups` (`owner_id`,`updated_at`,`id`);--> statement-breakpoint
CREATE INDEX `setups_status_submitted_idx` ON `setups` (`status`,`submitted_at`,`id`);--> statement-breakpoint
INSERT INTO `setup_results` (`setup_id`, `result_json`) SELECT `id`, `result_json` FROM `setups` WHERE `result_json` IS NOT NULL;--> statement-breakpoint
INSERT OR IGNORE INTO `setup_flags` (`setup_id`, `code`, `level`) SELECT s.`id`, json_extract(f.value, '$.code'), json_extract(f.value, '$.level') FROM `setups` s, json_each(s.`result_json`, '$.flags') f WHERE s.`result_json` IS NOT NULL AND json_extract(f.value, '$.level') IN ('caution', 'stop') AND json_extract(f.value, '$.code') IN (SELECT value FROM json_each('["free-lift","trim-calm","trim-unstable","trim-wind","trim-gust","tether-angle-wind","tether-angle-gust","mount-off-rail","thread-mismatch","adapter-mismatch","mount-rated-load","thread-capacity","safety-line","clearance-hull","clearance-tether","tether-length","tether-strength","helium-top-up","moored-balloon-rules","tether-height"]'));--> statement-breakpoint
ALTER TABLE `setups` DROP COLUMN `result_json`;--> statement-breakpoint
CREATE INDEX `setup_payloads_template_idx` ON `setup_payloads` (`template_id`);