ALTER TABLE `setups` ADD `wind_measured_at_m` real DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `wind_shear_exponent` real DEFAULT 0.14285714285714285 NOT NULL;--> statement-breakpoint
ALTER TABLE `setups` ADD `relative_humidity` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `tether_diameter_m` real;--> statement-breakpoint
ALTER TABLE `setups` ADD `target_height_m` real;