CREATE TABLE `account` (
	`id` text PRIMARY KEY NOT NULL,
	`account_id` text NOT NULL,
	`provider_id` text NOT NULL,
	`user_id` text NOT NULL,
	`access_token` text,
	`refresh_token` text,
	`id_token` text,
	`access_token_expires_at` integer,
	`refresh_token_expires_at` integer,
	`scope` text,
	`password` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `account_user_id_idx` ON `account` (`user_id`);--> statement-breakpoint
CREATE TABLE `adapters` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`from_thread` text NOT NULL,
	`to_thread` text NOT NULL,
	`mass_kg` real NOT NULL,
	`rated_load_kg` real NOT NULL,
	CONSTRAINT "adapters_from_check" CHECK(from_thread in ('1/4-20 UNC', '3/8-16 UNC', 'strap')),
	CONSTRAINT "adapters_to_check" CHECK(to_thread in ('1/4-20 UNC', '3/8-16 UNC'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `adapters_name_unique` ON `adapters` (`name`);--> statement-breakpoint
CREATE TABLE `attachments` (
	`id` text PRIMARY KEY NOT NULL,
	`setup_id` text NOT NULL,
	`uploader_id` text NOT NULL,
	`file_name` text NOT NULL,
	`content_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`storage_key` text NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploader_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `attachments_storage_key_unique` ON `attachments` (`storage_key`);--> statement-breakpoint
CREATE INDEX `attachments_setup_idx` ON `attachments` (`setup_id`);--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` text PRIMARY KEY NOT NULL,
	`actor_id` text,
	`action` text NOT NULL,
	`entity_type` text NOT NULL,
	`entity_id` text NOT NULL,
	`detail_json` text DEFAULT '{}' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`actor_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `audit_log_entity_idx` ON `audit_log` (`entity_type`,`entity_id`);--> statement-breakpoint
CREATE TABLE `comments` (
	`id` text PRIMARY KEY NOT NULL,
	`setup_id` text NOT NULL,
	`author_id` text NOT NULL,
	`body` text NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `comments_setup_idx` ON `comments` (`setup_id`);--> statement-breakpoint
CREATE TABLE `decisions` (
	`id` text PRIMARY KEY NOT NULL,
	`setup_id` text NOT NULL,
	`reviewer_id` text NOT NULL,
	`outcome` text NOT NULL,
	`setup_version` integer NOT NULL,
	`reasons_json` text DEFAULT '[]' NOT NULL,
	`note` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`reviewer_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "decisions_outcome_check" CHECK(outcome in ('approved', 'changes_requested'))
);
--> statement-breakpoint
CREATE INDEX `decisions_setup_idx` ON `decisions` (`setup_id`);--> statement-breakpoint
CREATE TABLE `envelope_models` (
	`id` text PRIMARY KEY NOT NULL,
	`slug` text NOT NULL,
	`name` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`hull_json` text NOT NULL,
	`gas_volume_m3` real NOT NULL,
	`nominal_mass_kg` real NOT NULL,
	`buoyancy_centre_x_m` real NOT NULL,
	`buoyancy_centre_z_m` real NOT NULL,
	`mass_centre_x_m` real NOT NULL,
	`mass_centre_z_m` real NOT NULL,
	`tether_point_x_m` real NOT NULL,
	`tether_point_z_m` real NOT NULL,
	`rail_start_x_m` real NOT NULL,
	`rail_end_x_m` real NOT NULL,
	`rail_z_m` real NOT NULL,
	`rail_tab_count` integer NOT NULL,
	`aero_json` text,
	`limits_json` text DEFAULT '{}' NOT NULL,
	`glb_path` text NOT NULL,
	`active` integer DEFAULT true NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL
);
--> statement-breakpoint
CREATE UNIQUE INDEX `envelope_models_slug_unique` ON `envelope_models` (`slug`);--> statement-breakpoint
CREATE TABLE `envelope_units` (
	`id` text PRIMARY KEY NOT NULL,
	`model_id` text NOT NULL,
	`serial` text NOT NULL,
	`owner_id` text,
	`measured_mass_kg` real NOT NULL,
	`measured_gross_lift_kg` real NOT NULL,
	`measured_at_temperature_c` real NOT NULL,
	`measured_at_altitude_m` real NOT NULL,
	`measured_on` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`model_id`) REFERENCES `envelope_models`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `envelope_units_serial_unique` ON `envelope_units` (`serial`);--> statement-breakpoint
CREATE INDEX `envelope_units_owner_idx` ON `envelope_units` (`owner_id`);--> statement-breakpoint
CREATE TABLE `mounts` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`thread` text NOT NULL,
	`mass_kg` real NOT NULL,
	`rated_load_kg` real NOT NULL,
	`safety_line_breaking_load_n` real NOT NULL,
	`active` integer DEFAULT true NOT NULL,
	CONSTRAINT "mounts_thread_check" CHECK(thread in ('1/4-20 UNC', '3/8-16 UNC'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `mounts_name_unique` ON `mounts` (`name`);--> statement-breakpoint
CREATE TABLE `payload_templates` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`category` text NOT NULL,
	`mass_kg` real NOT NULL,
	`shape` text NOT NULL,
	`length_m` real NOT NULL,
	`width_m` real NOT NULL,
	`height_m` real NOT NULL,
	`attachment` text NOT NULL,
	`drag_area_m2` real DEFAULT 0 NOT NULL,
	`offset_x_m` real DEFAULT 0 NOT NULL,
	`offset_z_m` real NOT NULL,
	CONSTRAINT "payload_templates_category_check" CHECK(category in ('antenna', 'camera', 'sensor', 'radio', 'light', 'other')),
	CONSTRAINT "payload_templates_shape_check" CHECK(shape in ('box', 'cylinder', 'rod')),
	CONSTRAINT "payload_templates_attachment_check" CHECK(attachment in ('1/4-20 UNC', '3/8-16 UNC', 'strap'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `payload_templates_name_unique` ON `payload_templates` (`name`);--> statement-breakpoint
CREATE TABLE `rate_limit` (
	`id` text PRIMARY KEY NOT NULL,
	`key` text NOT NULL,
	`count` integer NOT NULL,
	`last_request` integer NOT NULL
);
--> statement-breakpoint
CREATE UNIQUE INDEX `rate_limit_key_unique` ON `rate_limit` (`key`);--> statement-breakpoint
CREATE TABLE `session` (
	`id` text PRIMARY KEY NOT NULL,
	`expires_at` integer NOT NULL,
	`token` text NOT NULL,
	`ip_address` text,
	`user_agent` text,
	`user_id` text NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `session_token_unique` ON `session` (`token`);--> statement-breakpoint
CREATE INDEX `session_user_id_idx` ON `session` (`user_id`);--> statement-breakpoint
CREATE TABLE `setup_payloads` (
	`id` text PRIMARY KEY NOT NULL,
	`setup_id` text NOT NULL,
	`template_id` text,
	`sort_order` integer NOT NULL,
	`name` text NOT NULL,
	`adapter_id` text,
	`category` text NOT NULL,
	`mass_kg` real NOT NULL,
	`shape` text NOT NULL,
	`length_m` real NOT NULL,
	`width_m` real NOT NULL,
	`height_m` real NOT NULL,
	`attachment` text NOT NULL,
	`drag_area_m2` real DEFAULT 0 NOT NULL,
	`offset_x_m` real DEFAULT 0 NOT NULL,
	`offset_z_m` real NOT NULL,
	FOREIGN KEY (`setup_id`) REFERENCES `setups`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`template_id`) REFERENCES `payload_templates`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`adapter_id`) REFERENCES `adapters`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "setup_payloads_category_check" CHECK(category in ('antenna', 'camera', 'sensor', 'radio', 'light', 'other')),
	CONSTRAINT "setup_payloads_shape_check" CHECK(shape in ('box', 'cylinder', 'rod')),
	CONSTRAINT "setup_payloads_attachment_check" CHECK(attachment in ('1/4-20 UNC', '3/8-16 UNC', 'strap'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `setup_payloads_order_idx` ON `setup_payloads` (`setup_id`,`sort_order`);--> statement-breakpoint
CREATE TABLE `setups` (
	`id` text PRIMARY KEY NOT NULL,
	`owner_id` text NOT NULL,
	`name` text NOT NULL,
	`model_id` text NOT NULL,
	`unit_id` text,
	`mount_id` text NOT NULL,
	`mount_position_x_m` real NOT NULL,
	`site_name` text DEFAULT '' NOT NULL,
	`altitude_m` real DEFAULT 0 NOT NULL,
	`temperature_c` real,
	`pressure_pa` real,
	`wind_m_s` real DEFAULT 0 NOT NULL,
	`gust_m_s` real,
	`purity` real DEFAULT 1 NOT NULL,
	`superheat_k` real DEFAULT 0 NOT NULL,
	`fill_fraction` real DEFAULT 1 NOT NULL,
	`tether_mass_per_metre_kg` real,
	`tether_length_out_m` real,
	`tether_breaking_load_n` real,
	`status` text DEFAULT 'draft' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`result_json` text,
	`worst_flag` text,
	`cautions_acknowledged` integer DEFAULT false NOT NULL,
	`submitted_at` integer,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`model_id`) REFERENCES `envelope_models`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`unit_id`) REFERENCES `envelope_units`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`mount_id`) REFERENCES `mounts`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "setups_status_check" CHECK(status in ('draft', 'submitted', 'changes_requested', 'approved')),
	CONSTRAINT "setups_worst_flag_check" CHECK(worst_flag is null or worst_flag in ('ok', 'caution', 'stop'))
);
--> statement-breakpoint
CREATE INDEX `setups_owner_idx` ON `setups` (`owner_id`);--> statement-breakpoint
CREATE INDEX `setups_status_idx` ON `setups` (`status`);--> statement-breakpoint
CREATE TABLE `user` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`email` text NOT NULL,
	`email_verified` integer DEFAULT false NOT NULL,
	`image` text,
	`role` text DEFAULT 'customer' NOT NULL,
	`unit_system` text DEFAULT 'metric' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	CONSTRAINT "user_role_check" CHECK(role in ('customer', 'support', 'maker')),
	CONSTRAINT "user_unit_system_check" CHECK(unit_system in ('metric', 'imperial'))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `user_email_unique` ON `user` (`email`);--> statement-breakpoint
CREATE TABLE `verification` (
	`id` text PRIMARY KEY NOT NULL,
	`identifier` text NOT NULL,
	`value` text NOT NULL,
	`expires_at` integer NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL
);
--> statement-breakpoint
CREATE INDEX `verification_identifier_idx` ON `verification` (`identifier`);