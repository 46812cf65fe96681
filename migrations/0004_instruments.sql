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
ALTER TABLE `equipment_profiles` ADD CONSTRAINT `equipment_profiles_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `instrument_calibrations` ADD CONSTRAINT `instrument_calibrations_instrument_id_instruments_id_fk` FOREIGN KEY (`instrument_id`) REFERENCES `instruments`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `instruments` ADD CONSTRAINT `instruments_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `equipment_profiles_owner_idx` ON `equipment_profiles` (`owner_id`,`is_default`);--> statement-breakpoint
CREATE INDEX `instrument_calibrations_instrument_idx` ON `instrument_calibrations` (`instrument_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `instruments_owner_idx` ON `instruments` (`owner_id`,`archived`,`kind`);