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
ALTER TABLE `recipe_club_shares` ADD CONSTRAINT `recipe_club_shares_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_club_shares` ADD CONSTRAINT `recipe_club_shares_club_id_clubs_id_fk` FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_fermentables` ADD CONSTRAINT `recipe_fermentables_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_hops` ADD CONSTRAINT `recipe_hops_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_mash_steps` ADD CONSTRAINT `recipe_mash_steps_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipes` ADD CONSTRAINT `recipes_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipes` ADD CONSTRAINT `recipes_cloned_from_id_recipes_id_fk` FOREIGN KEY (`cloned_from_id`) REFERENCES `recipes`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `recipe_club_shares_club_idx` ON `recipe_club_shares` (`club_id`);--> statement-breakpoint
CREATE INDEX `recipe_fermentables_recipe_idx` ON `recipe_fermentables` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipe_hops_recipe_idx` ON `recipe_hops` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipe_mash_steps_recipe_idx` ON `recipe_mash_steps` (`recipe_id`,`position`);--> statement-breakpoint
CREATE INDEX `recipes_owner_idx` ON `recipes` (`owner_id`);--> statement-breakpoint
CREATE INDEX `recipes_name_idx` ON `recipes` (`name`);