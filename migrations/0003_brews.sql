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
CREATE INDEX `brew_club_shares_club_idx` ON `brew_club_shares` (`club_id`);--> statement-breakpoint
CREATE INDEX `brew_decisions_brew_idx` ON `brew_decisions` (`brew_id`,`decided_at`);--> statement-breakpoint
CREATE INDEX `brew_notes_brew_idx` ON `brew_notes` (`brew_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `brew_readings_brew_idx` ON `brew_readings` (`brew_id`,`taken_at`);--> statement-breakpoint
CREATE INDEX `brews_owner_idx` ON `brews` (`owner_id`,`brewed_on`);--> statement-breakpoint
CREATE INDEX `brews_recipe_idx` ON `brews` (`recipe_id`);--> statement-breakpoint
CREATE INDEX `reading_photos_reading_idx` ON `reading_photos` (`reading_id`);--> statement-breakpoint
CREATE INDEX `reading_photos_brew_idx` ON `reading_photos` (`brew_id`);