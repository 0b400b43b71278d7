CREATE TABLE `shot_pairs` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`before_asset_id` integer NOT NULL,
	`after_asset_id` integer NOT NULL,
	`caption` text DEFAULT '' NOT NULL,
	`position` integer NOT NULL,
	`crop_x` real,
	`crop_y` real,
	`crop_w` real,
	`crop_h` real,
	`created_by` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`before_asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`after_asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `shot_pairs_shop_job_idx` ON `shot_pairs` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `shot_pairs_job_before_after_uq` ON `shot_pairs` (`job_id`,`before_asset_id`,`after_asset_id`);--> statement-breakpoint
ALTER TABLE `media_assets` ADD `phash` text;