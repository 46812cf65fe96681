CREATE TABLE `users` (
	`id` int AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`display_name` varchar(80) NOT NULL,
	`unit_system` enum('metric','us') NOT NULL DEFAULT 'metric',
	`gravity_unit` enum('sg','plato') NOT NULL DEFAULT 'sg',
	`site_role` enum('user','admin') NOT NULL DEFAULT 'user',
	`token_version` int NOT NULL DEFAULT 0,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `club_invitations` (
	`id` int AUTO_INCREMENT NOT NULL,
	`club_id` int NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('member','mentor','organiser') NOT NULL DEFAULT 'member',
	`token_hash` char(64) NOT NULL,
	`invited_by` int,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	`expires_at` timestamp NOT NULL,
	`accepted_at` timestamp,
	`accepted_by` int,
	`revoked_at` timestamp,
	`revoked_reason` enum('revoked','replaced'),
	CONSTRAINT `club_invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `club_invitations_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `club_memberships` (
	`club_id` int NOT NULL,
	`user_id` int NOT NULL,
	`role` enum('member','mentor','organiser') NOT NULL DEFAULT 'member',
	`joined_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	CONSTRAINT `club_memberships_club_id_user_id_pk` PRIMARY KEY(`club_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `clubs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`description` text,
	`created_by` int,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	CONSTRAINT `clubs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `password_reset_tokens` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` int NOT NULL,
	`token_hash` char(64) NOT NULL,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	`expires_at` timestamp NOT NULL,
	`used_at` timestamp,
	CONSTRAINT `password_reset_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `password_reset_tokens_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `recipe_club_shares` (
	`recipe_id` int NOT NULL,
	`club_id` int NOT NULL,
	`shared_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	CONSTRAINT `recipe_club_shares_recipe_id_club_id_pk` PRIMARY KEY(`recipe_id`,`club_id`)
);
--> statement-breakpoint
CREATE TABLE `recipe_fermentables` (
	`id` int AUTO_INCREMENT NOT NULL,
	`recipe_id` int NOT NULL,
	`position` int NOT NULL,
	`name` varchar(120) NOT NULL,
	`kind` enum('grain','dry-extract','liquid-extract','sugar','other') NOT NULL,
	`amount_kg` double NOT NULL,
	`potential_points_l_per_kg` double NOT NULL,
	CONSTRAINT `recipe_fermentables_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `recipe_hops` (
	`id` int AUTO_INCREMENT NOT NULL,
	`recipe_id` int NOT NULL,
	`position` int NOT NULL,
	`name` varchar(120) NOT NULL,
	`amount_g` double NOT NULL,
	`minutes` double NOT NULL,
	`alpha_acid_percent` double NOT NULL,
	CONSTRAINT `recipe_hops_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `recipe_mash_steps` (
	`id` int AUTO_INCREMENT NOT NULL,
	`recipe_id` int NOT NULL,
	`position` int NOT NULL,
	`temp_c` double NOT NULL,
	`minutes` double NOT NULL,
	CONSTRAINT `recipe_mash_steps_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `recipes` (
	`id` int AUTO_INCREMENT NOT NULL,
	`owner_id` int NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	`name` varchar(120) NOT NULL,
	`style` varchar(80) NOT NULL DEFAULT '',
	`notes` text NOT NULL,
	`batch_volume_l` double NOT NULL,
	`pre_boil_volume_l` double NOT NULL,
	`post_boil_volume_l` double NOT NULL,
	`boil_minutes` double NOT NULL,
	`boil_off_l_per_hour` double NOT NULL,
	`efficiency` double NOT NULL,
	`target_og` double NOT NULL,
	`target_fg` double NOT NULL,
	`mash_ph_target` double NOT NULL DEFAULT 5.2,
	`fermentation_temp_min_c` double NOT NULL,
	`fermentation_temp_max_c` double NOT NULL,
	`yeast_name` varchar(120) NOT NULL DEFAULT '',
	`yeast_amount` varchar(120) NOT NULL DEFAULT '',
	`cloned_from_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `recipes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `brew_club_shares` (
	`brew_id` int NOT NULL,
	`club_id` int NOT NULL,
	`shared_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	CONSTRAINT `brew_club_shares_brew_id_club_id_pk` PRIMARY KEY(`brew_id`,`club_id`)
);
--> statement-breakpoint
CREATE TABLE `brew_decisions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`input` json NOT NULL,
	`result` json NOT NULL,
	`choice` json NOT NULL,
	`note` text NOT NULL,
	`decided_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `brew_decisions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `brew_notes` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`kind` enum('note','recompute') NOT NULL DEFAULT 'note',
	`stage` enum('mash','boil','chill','og'),
	`body` text NOT NULL,
	`details` json,
	`author_id` int,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `brew_notes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `brew_readings` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`stage` enum('mash','boil','chill','og') NOT NULL,
	`kind` enum('mash_temp','mash_ph','pre_boil_gravity','late_boil_gravity','pitch_temp','og') NOT NULL,
	`instrument_id` int,
	`instrument_snapshot` json NOT NULL,
	`raw` json NOT NULL,
	`corrected_value` double NOT NULL,
	`correction` json,
	`warnings` json NOT NULL,
	`volume_l` double,
	`taken_at` timestamp(3) NOT NULL,
	`note` text NOT NULL,
	`recomputed_at` timestamp(3),
	`recomputed_from` json,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `brew_readings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `brew_stages` (
	`brew_id` int NOT NULL,
	`stage` enum('mash','boil','chill','og') NOT NULL,
	`started_at` timestamp(3),
	`completed_at` timestamp(3),
	`skipped_at` timestamp(3),
	CONSTRAINT `brew_stages_brew_id_stage_pk` PRIMARY KEY(`brew_id`,`stage`)
);
--> statement-breakpoint
CREATE TABLE `brews` (
	`id` int AUTO_INCREMENT NOT NULL,
	`owner_id` int NOT NULL,
	`recipe_id` int,
	`name` varchar(120) NOT NULL,
	`status` enum('brewing','fermenting','packaged') NOT NULL DEFAULT 'brewing',
	`brewed_on` date NOT NULL,
	`targets_snapshot` json NOT NULL,
	`equipment_snapshot` json NOT NULL,
	`boil_off_l_per_hour` double,
	`current_stage` enum('mash','boil','chill','og') NOT NULL DEFAULT 'mash',
	`pitched_at` timestamp(3),
	`notes` text NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `brews_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reading_photos` (
	`id` int AUTO_INCREMENT NOT NULL,
	`reading_id` int NOT NULL,
	`brew_id` int NOT NULL,
	`mime` enum('image/jpeg','image/png','image/webp') NOT NULL,
	`size_bytes` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`data` mediumblob NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `reading_photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `equipment_profiles` (
	`id` int AUTO_INCREMENT NOT NULL,
	`owner_id` int NOT NULL,
	`name` varchar(80) NOT NULL,
	`is_default` boolean NOT NULL DEFAULT false,
	`boil_off_l_per_hour` double NOT NULL,
	`trub_loss_l` double NOT NULL,
	`dead_space_l` double NOT NULL,
	`cooling_shrinkage` double NOT NULL,
	`elevation_m` double,
	`kettle_capacity_l` double,
	`boil_off_measurement` json,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	`updated_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `equipment_profiles_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `instrument_calibrations` (
	`id` int AUTO_INCREMENT NOT NULL,
	`instrument_id` int NOT NULL,
	`method` enum('created','wcf-pairs','thermometer-check','ph-two-point','set') NOT NULL,
	`inputs` json NOT NULL,
	`result` json,
	`before_snapshot` json,
	`after_snapshot` json NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `instrument_calibrations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `instruments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`owner_id` int NOT NULL,
	`kind` enum('hydrometer','refractometer','thermometer','ph_meter') NOT NULL,
	`name` varchar(80) NOT NULL,
	`notes` text,
	`calibration_temp_c` double,
	`wcf` double,
	`wcf_source` enum('default','entered','measured'),
	`offset_c` double,
	`offset_checked_on` date,
	`resolution_ph` double,
	`calibrated_on` date,
	`buffer_low_ph` double,
	`buffer_high_ph` double,
	`reminder_days` int,
	`archived` boolean NOT NULL DEFAULT false,
	`created_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP,
	`updated_at` timestamp NOT NULL DEFAULT CURRENT_TIMESTAMP ON UPDATE CURRENT_TIMESTAMP,
	CONSTRAINT `instruments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
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
CREATE TABLE `comments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`brew_id` int NOT NULL,
	`author_id` int,
	`target_kind` enum('brew','reading','decision','fermentation_reading') NOT NULL DEFAULT 'brew',
	`target_id` int,
	`body` text NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`edited_at` timestamp(3),
	CONSTRAINT `comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `club_invitations` ADD CONSTRAINT `club_invitations_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `club_invitations` ADD CONSTRAINT `club_invitations_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `club_invitations` ADD CONSTRAINT `club_invitations_accepted_by_users_id_fk` FOREIGN KEY (`accepted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `club_memberships` ADD CONSTRAINT `club_memberships_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `club_memberships` ADD CONSTRAINT `club_memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `clubs` ADD CONSTRAINT `clubs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `password_reset_tokens` ADD CONSTRAINT `password_reset_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_club_shares` ADD CONSTRAINT `recipe_club_shares_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_club_shares` ADD CONSTRAINT `recipe_club_shares_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_fermentables` ADD CONSTRAINT `recipe_fermentables_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_hops` ADD CONSTRAINT `recipe_hops_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_mash_steps` ADD CONSTRAINT `recipe_mash_steps_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipes` ADD CONSTRAINT `recipes_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipes` ADD CONSTRAINT `recipes_cloned_from_id_recipes_id_fk` FOREIGN KEY (`cloned_from_id`) REFERENCES `recipes`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_club_shares` ADD CONSTRAINT `brew_club_shares_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_club_shares` ADD CONSTRAINT `brew_club_shares_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_decisions` ADD CONSTRAINT `brew_decisions_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_notes` ADD CONSTRAINT `brew_notes_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_notes` ADD CONSTRAINT `brew_notes_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_readings` ADD CONSTRAINT `brew_readings_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brew_stages` ADD CONSTRAINT `brew_stages_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brews` ADD CONSTRAINT `brews_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `brews` ADD CONSTRAINT `brews_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reading_photos` ADD CONSTRAINT `reading_photos_reading_id_brew_readings_id_fk` FOREIGN KEY (`reading_id`) REFERENCES `brew_readings`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reading_photos` ADD CONSTRAINT `reading_photos_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `equipment_profiles` ADD CONSTRAINT `equipment_profiles_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `instrument_calibrations` ADD CONSTRAINT `instrument_calibrations_instrument_id_instruments_id_fk` FOREIGN KEY (`instrument_id`) REFERENCES `instruments`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `instruments` ADD CONSTRAINT `instruments_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_readings` ADD CONSTRAINT `fermentation_readings_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_readings` ADD CONSTRAINT `fermentation_readings_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_reminders` ADD CONSTRAINT `fermentation_reminders_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fermentation_settings` ADD CONSTRAINT `fermentation_settings_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packaging_records` ADD CONSTRAINT `packaging_records_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packaging_records` ADD CONSTRAINT `packaging_records_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_brew_id_brews_id_fk` FOREIGN KEY (`brew_id`) REFERENCES `brews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `club_invitations_club_email_idx` ON `club_invitations` (`club_id`,`email`);--> statement-breakpoint
CREATE INDEX `club_memberships_user_idx` ON `club_memberships` (`user_id`);--> statement-breakpoint
CREATE INDEX `password_reset_tokens_user_idx` ON `password_reset_tokens` (`user_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `recipe_club_shares_club_idx` ON `recipe_club_shares` (`club_id`);--> statement-breakpoint
CREATE INDEX `recipe_fermentables_recipe_idx` ON `recipe_fermentables` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipe_hops_recipe_idx` ON `recipe_hops` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipe_mash_steps_recipe_idx` ON `recipe_mash_steps` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipes_owner_idx` ON `recipes` (`owner_id`);--> statement-breakpoint
CREATE INDEX `recipes_name_idx` ON `recipes` (`name`);--> statement-breakpoint
CREATE INDEX `brew_club_shares_club_idx` ON `brew_club_shares` (`club_id`);--> statement-breakpoint
CREATE INDEX `brew_decisions_brew_idx` ON `brew_decisions` (`brew_id`,`decided_at`);--> statement-breakpoint
CREATE INDEX `brew_notes_brew_idx` ON `brew_notes` (`brew_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `brew_readings_brew_idx` ON `brew_readings` (`brew_id`,`taken_at`);--> statement-breakpoint
CREATE INDEX `brews_owner_idx` ON `brews` (`owner_id`,`brewed_on`);--> statement-breakpoint
CREATE INDEX `brews_recipe_idx` ON `brews` (`recipe_id`);--> statement-breakpoint
CREATE INDEX `reading_photos_reading_idx` ON `reading_photos` (`reading_id`);--> statement-breakpoint
CREATE INDEX `reading_photos_brew_idx` ON `reading_photos` (`brew_id`);--> statement-breakpoint
CREATE INDEX `equipment_profiles_owner_idx` ON `equipment_profiles` (`owner_id`,`is_default`);--> statement-breakpoint
CREATE INDEX `instrument_calibrations_instrument_idx` ON `instrument_calibrations` (`instrument_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `instruments_owner_idx` ON `instruments` (`owner_id`,`archived`,`kind`);--> statement-breakpoint
CREATE INDEX `fermentation_readings_brew_idx` ON `fermentation_readings` (`brew_id`,`taken_at`);--> statement-breakpoint
CREATE INDEX `fermentation_reminders_due_idx` ON `fermentation_reminders` (`sent_at`,`due_at`);--> statement-breakpoint
CREATE INDEX `comments_brew_idx` ON `comments` (`brew_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `comments_author_idx` ON `comments` (`author_id`);