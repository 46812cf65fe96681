CREATE INDEX `recipes_owner_updated_idx` ON `recipes` (`owner_id`,`updated_at`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_name_idx` ON `recipes` (`owner_id`,`name`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_style_idx` ON `recipes` (`owner_id`,`style`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_og_idx` ON `recipes` (`owner_id`,`target_og`,`id`);