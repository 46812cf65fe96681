CREATE TABLE `fermentation_readings` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`kind` enum('gravity','temperature') NOT NULL,
	`method` enum('hydrometer','refractometer','thermometer') NOT NULL,
	`instrument_id` int,
	`instrument_snapshot` json NOT NULL,
	`raw` json NOT NULL,
	`corrected_value` double NOT NULL,
	`correction` json,
	`warnings` json NOT NULL,
	`estimate` boolean NOT NULL DEFAULT false,
	`taken_at` timestamp(3) NOT NULL,
	`note` varchar(500) NOT NULL DEFAULT '',
	`source` enum('manual','csv') NOT NULL DEFAULT 'manual',
	`dedupe_key` char(64) NOT NULL,
	`created_by` int,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `fermentation_readings_id` PRIMARY KEY(`id`),
	CONSTRAINT `fermentation_readings_dedupe_uq` UNIQUE(`brew_id`,`dedupe_key`)
);
--> statement-breakpoint
CREATE TABLE `fermentation_reminders` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`kind` enum('first-fg-check','recheck') NOT NULL,
	`due_at` timestamp(3) NOT NULL,
	`reading_id` int,
	`claimed_by` varchar(64),
	`claimed_until` timestamp(3),
	`attempts` int NOT NULL DEFAULT 0,
	`sent_at` timestamp(3),
	`outcome` enum('sent','skipped','failed'),
	`outcome_note` varchar(200),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `fermentation_reminders_id` PRIMARY KEY(`id`),
	CONSTRAINT `fermentation_reminders_uq` UNIQUE(`brew_id`,`kind`,`due_at`)
);
--> statement-breakpoint
CREATE TABLE `fermentation_settings` (
	`user_id` int NOT NULL,
	`reminders_enabled` boolean NOT NULL DEFAULT true,
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `fermentation_settings_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
CREATE TABLE `packaging_records` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`container` enum('bottles','keg') NOT NULL,
	`volume_l` double NOT NULL,
	`warmest_temp_c` double NOT NULL,
	`target_co2_volumes` double NOT NULL,
	`sugar` enum('sucrose','dextrose','dme','none') NOT NULL,
	`priming_sugar_g` double,
	`residual_co2_volumes` double NOT NULL,
	`verdict_state` enum('too-early','moving','stable') NOT NULL,
	`verdict_reason` text NOT NULL,
	`override` boolean NOT NULL DEFAULT false,
	`override_reason` varchar(500) NOT NULL DEFAULT '',
	`note` varchar(500) NOT NULL DEFAULT '',
	`packaged_at` timestamp(3) NOT NULL,
	`created_by` int,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `packaging_records_id` PRIMARY KEY(`id`),
	CONSTRAINT `packaging_records_brew_uq` UNIQUE(`brew_id`)
);
--> statement-breakpoint
ALTER TABLE `fermentation_readings` ADD CONSTRAINT `fermentation_readings_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_readings` ADD CONSTRAINT `fermentation_readings_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_reminders` ADD CONSTRAINT `fermentation_reminders_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_settings` ADD CONSTRAINT `fermentation_settings_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packaging_records` ADD CONSTRAINT `packaging_records_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packaging_records` ADD CONSTRAINT `packaging_records_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `fermentation_readings_brew_idx` ON `fermentation_readings` (`brew_id`,`taken_at`);--> statement-breakpoint
CREATE INDEX `fermentation_reminders_due_idx` ON `fermentation_reminders` (`sent_at`,`due_at`);