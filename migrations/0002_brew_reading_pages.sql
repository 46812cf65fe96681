ALTER TABLE `brew_readings` ADD `instrument_note` varchar(80);--> statement-breakpoint
CREATE INDEX `brew_readings_kind_idx` ON `brew_readings` (`brew_id`,`kind`,`taken_at`);--> statement-breakpoint
CREATE INDEX `brew_readings_note_idx` ON `brew_readings` (`brew_id`,`instrument_note`,`taken_at`);