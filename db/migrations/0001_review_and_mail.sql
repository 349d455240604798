CREATE TABLE `mail_outbox` (
	`id` text PRIMARY KEY NOT NULL,
	`kind` text NOT NULL,
	`to_address` text NOT NULL,
	`subject` text NOT NULL,
	`text_body` text NOT NULL,
	`html_body` text NOT NULL,
	`status` text DEFAULT 'pending' NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`next_attempt_at` integer NOT NULL,
	`last_error` text,
	`sent_at` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	CONSTRAINT "mail_outbox_status_check" CHECK(status in ('pending', 'sent', 'failed'))
);
--> statement-breakpoint
CREATE INDEX `mail_outbox_due_idx` ON `mail_outbox` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE TABLE `setup_reads` (
	`setup_id` text NOT NULL,
	`user_id` text NOT NULL,
	`last_read_at` integer NOT NULL,
	PRIMARY KEY(`setup_id`, `user_id`),
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
DROP INDEX `setups_owner_idx`;--> statement-breakpoint
DROP INDEX `setups_status_idx`;--> statement-breakpoint
ALTER TABLE `setups` ADD `payload_mass_kg` real DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `free_lift_ratio` real;--> statement-breakpoint
CREATE INDEX `setups_owner_updated_idx` ON `setups` (`owner_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `setups_status_submitted_idx` ON `setups` (`status`,`submitted_at`);--> statement-breakpoint
DROP INDEX `audit_log_entity_idx`;--> statement-breakpoint
CREATE INDEX `audit_log_entity_idx` ON `audit_log` (`entity_type`,`entity_id`,`created_at`);--> statement-breakpoint
DROP INDEX `comments_setup_idx`;--> statement-breakpoint
CREATE INDEX `comments_setup_idx` ON `comments` (`setup_id`,`created_at`);--> statement-breakpoint
DROP INDEX `decisions_setup_idx`;--> statement-breakpoint
CREATE INDEX `decisions_setup_idx` ON `decisions` (`setup_id`,`created_at`);--> statement-breakpoint
UPDATE `setups` SET `payload_mass_kg` = coalesce((SELECT sum(`mass_kg`) FROM `setup_payloads` WHERE `setup_payloads`.`setup_id` = `setups`.`id`), 0), `free_lift_ratio` = json_extract(`result_json`, '$.freeLiftRatio');
