CREATE TABLE `derived_stamps` (
	`name` text PRIMARY KEY NOT NULL,
	`stamp` text NOT NULL
);
--> statement-breakpoint
CREATE TABLE `insight_rollups` (
	`measure` text NOT NULL,
	`span` text NOT NULL,
	`first_day` integer NOT NULL,
	`model_id` text NOT NULL,
	`status` text NOT NULL,
	`bin` integer DEFAULT 0 NOT NULL,
	`label` text DEFAULT '' NOT NULL,
	`level` text DEFAULT '' NOT NULL,
	`count` integer NOT NULL,
	PRIMARY KEY(`measure`, `span`, `first_day`, `model_id`, `status`, `bin`, `label`, `level`),
	CONSTRAINT "insight_rollups_measure_check" CHECK(measure in ('setups', 'setup_payload_mass', 'free_lift_ratio', 'rail_position', 'payload_mass', 'template_usage', 'flags', 'send_back_reasons')),
	CONSTRAINT "insight_rollups_span_check" CHECK(span in ('day', 'month', 'year'))
);
--> statement-breakpoint
CREATE INDEX `insight_rollups_group_idx` ON `insight_rollups` (`measure`,`span`,`bin`,`label`,`level`,`first_day`,`model_id`,`status`,`count`);--> statement-breakpoint
CREATE INDEX `insight_rollups_empty_idx` ON `insight_rollups` (`measure`) WHERE count = 0;--> statement-breakpoint
CREATE TABLE `setup_search_keys` (
	`key` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`setup_id` text NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `setup_search_keys_setup_id_unique` ON `setup_search_keys` (`setup_id`);