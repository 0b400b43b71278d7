CREATE TABLE `media_assets` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`job_id` integer NOT NULL,
	`kind` text NOT NULL,
	`phase` text NOT NULL,
	`area` text NOT NULL,
	`source` text NOT NULL,
	`caption` text DEFAULT '' NOT NULL,
	`original_key` text,
	`original_name` text DEFAULT '' NOT NULL,
	`mime` text NOT NULL,
	`sha256` text NOT NULL,
	`byte_size` integer NOT NULL,
	`width` integer,
	`height` integer,
	`duration_ms` integer,
	`captured_at` integer,
	`uploaded_at` integer NOT NULL,
	`uploaded_by` integer NOT NULL,
	`source_asset_id` integer,
	`timecode_ms` integer,
	`derivative_status` text NOT NULL,
	`derivative_error` text,
	`deleted_at` integer,
	`deleted_by` integer,
	`purged_at` integer,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`source_asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`deleted_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `media_assets_shop_job_idx` ON `media_assets` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `media_assets_status_idx` ON `media_assets` (`derivative_status`);--> statement-breakpoint
CREATE TABLE `media_derivatives` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`asset_id` integer NOT NULL,
	`variant` text NOT NULL,
	`key` text NOT NULL,
	`width` integer NOT NULL,
	`height` integer NOT NULL,
	`bytes` integer NOT NULL,
	`sha256` text NOT NULL,
	FOREIGN KEY (`asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `media_derivatives_asset_variant_unique` ON `media_derivatives` (`asset_id`,`variant`);--> statement-breakpoint
CREATE TABLE `finding_media` (
	`finding_id` integer NOT NULL,
	`asset_id` integer NOT NULL,
	`position` integer NOT NULL,
	PRIMARY KEY(`finding_id`, `asset_id`),
	FOREIGN KEY (`finding_id`) REFERENCES `findings`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `finding_media_asset_idx` ON `finding_media` (`asset_id`);