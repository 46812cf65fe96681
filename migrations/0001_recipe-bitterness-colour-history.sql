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
ALTER TABLE `users` ADD `colour_scale` enum('srm','ebc') DEFAULT 'srm' NOT NULL;--> statement-breakpoint
ALTER TABLE `recipe_fermentables` ADD `colour_lovibond` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `target_ibu` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `target_colour_srm` double;--> statement-breakpoint
ALTER TABLE `recipes` ADD `souring_target_ph` double;--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD CONSTRAINT `recipe_versions_recipe_id_recipes_id_fk` FOREIGN KEY (`recipe_id`) REFERENCES `recipes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `recipe_versions` ADD CONSTRAINT `recipe_versions_saved_by_id_users_id_fk` FOREIGN KEY (`saved_by_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;