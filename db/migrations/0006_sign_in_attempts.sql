CREATE TABLE `sign_in_attempts` (
	`key` text PRIMARY KEY NOT NULL,
	`failures` integer NOT NULL,
	`window_ends_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `sign_in_attempts_window_ends_at_idx` ON `sign_in_attempts` (`window_ends_at`);