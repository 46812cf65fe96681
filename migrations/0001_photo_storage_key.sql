ALTER TABLE `reading_photos` MODIFY COLUMN `data` mediumblob;--> statement-breakpoint
ALTER TABLE `reading_photos` ADD `storage_key` varchar(255);