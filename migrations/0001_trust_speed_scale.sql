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
ALTER TABLE `packaging_records` MODIFY COLUMN `verdict_state` enum('no-reading','too-early','moving','stuck','stable') NOT NULL;--> statement-breakpoint
ALTER TABLE `instruments` ADD `resolution_sg` double;--> statement-breakpoint
ALTER TABLE `instruments` ADD `offset_scale` double;--> statement-breakpoint
ALTER TABLE `idempotency_keys` ADD CONSTRAINT `idempotency_keys_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `idempotency_keys_expires_idx` ON `idempotency_keys` (`expires_at`);--> statement-breakpoint
CREATE INDEX `revoked_sessions_expires_idx` ON `revoked_sessions` (`expires_at`);--> statement-breakpoint
CREATE INDEX `recipes_owner_updated_idx` ON `recipes` (`owner_id`,`updated_at`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_name_idx` ON `recipes` (`owner_id`,`name`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_style_idx` ON `recipes` (`owner_id`,`style`,`id`);--> statement-breakpoint
CREATE INDEX `recipes_owner_og_idx` ON `recipes` (`owner_id`,`target_og`,`id`);