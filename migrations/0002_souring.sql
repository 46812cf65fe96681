ALTER TABLE `brew_notes` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og');--> statement-breakpoint
ALTER TABLE `brew_readings` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brew_readings` MODIFY COLUMN `kind` enum('mash_temp','mash_ph','souring_ph','pre_boil_gravity','late_boil_gravity','pitch_temp','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brew_stages` MODIFY COLUMN `stage` enum('mash','souring','boil','chill','og') NOT NULL;--> statement-breakpoint
ALTER TABLE `brews` MODIFY COLUMN `current_stage` enum('mash','souring','boil','chill','og') NOT NULL DEFAULT 'mash';