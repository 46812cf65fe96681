CREATE TABLE `recipe_versions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`recipe_id` int NOT NULL,
	`version` int NOT NULL,
	`data` json NOT NULL,
	`saved_by_id` int,
	`saved_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `recipe_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `recipe_versions_recipe_version_idx` UNIQUE(`recipe_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `idempotency_keys` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` int NOT NULL,
	`idem_key` varchar(200) NOT NULL,
	`request` varchar(300) NOT NULL,
	`status` smallint,
	`body` json,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	`expires_at` timestamp NOT NULL,
	CONSTRAINT `idempotency_keys_id` PRIMARY KEY(`id`),
	CONSTRAINT `idempotency_keys_user_key_uq` UNIQUE(`user_id`,`idem_key`)
);
--> statement-breakpoint
CREATE TABLE `revoked_sessions` (
	`session_id` char(22) NOT NULL,
	`expires_at` timestamp NOT NULL,
	CONSTRAINT `revoked_sessions_session_id` PRIMARY KEY(`session_id`)
);
--> statement-breakpoint
ALTER TABLE `brew_notes` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og');--> statement-breakpoint
ALTER TABLE `brew_readings` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brew_readings` MODIFY COLUMN `kind` enum('mash_temp','mash_ph','souring_ph','pre_boil_gravity','late_boil_gravity','pitch_temp','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brew_stages` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brews` MODIFY COLUMN `current_stage` enum('mash','souring','boil','chill','og') NOT NULL DEFAULT 'mash';--> statement-breakpoint
ALTER TABLE `reading_photos` MODIFY COLUMN `data` mediumblob;--> statement-breakpoint
ALTER TABLE `packaging_records` MODIFY COLUMN `verdict_state` enum('no-reading','too-early','moving','stuck','stable') NOT NULL;--> statement-breakpoint
ALTER TABLE `users` ADD `colour_scale` enum('srm','ebc') DEFAULT 'srm' NOT NULL;--> statement-breakpoint
ALTER TABLE `users` ADD `gallon_unit` enum('us','imperial') DEFAULT 'us' NOT NULL;--> statement-breakpoint
ALTER TABLE `recipe_fermentables` ADD `colour_lovibond` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `target_ibu` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `target_colour_srm` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `souring_target_ph` double;--> statement-breakpoint
ALTER TABLE `reading_photos` ADD `storage_key` varchar(255);--> statement-breakpoint
ALTER TABLE `instruments` ADD `resolution_sg` double;--> statement-breakpoint
ALTER TABLE `instruments` ADD `offset_scale` double;--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD CONSTRAINT `recipe_versions_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD CONSTRAINT `recipe_versions_saved_by_id_users_id_fk` FOREIGN KEY (`saved_by_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `idempotency_keys` ADD CONSTRAINT `idempotency_keys_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `idempotency_keys_expires_idx` ON `idempotency_keys` (`expires_at`);--> statement-breakpoint
CREATE INDEX `revoked_sessions_expires_idx` ON `revoked_sessions` (`expires_at`);--> statement-breakpoint
CREATE INDEX `recipes_owner_updated_idx` ON `recipes` (`owner_id`,`updated_at`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_name_idx` ON `recipes` (`owner_id`,`name`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_style_idx` ON `recipes` (`owner_id`,`style`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_og_idx` ON `recipes` (`owner_id`,`target_og`,`id`);