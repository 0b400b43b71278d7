CREATE TABLE `annotation_versions` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`asset_id` integer NOT NULL,
	`version` integer NOT NULL,
	`document` text NOT NULL,
	`saved_at` integer NOT NULL,
	`saved_by` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`saved_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `annotation_versions_asset_version_unique` ON `annotation_versions` (`asset_id`,`version`);--> statement-breakpoint
CREATE INDEX `annotation_versions_shop_idx` ON `annotation_versions` (`shop_id`);--> statement-breakpoint
CREATE TABLE `measurement_evidence` (
	`shop_id` integer NOT NULL,
	`measurement_id` integer NOT NULL,
	`asset_id` integer NOT NULL,
	`annotation_version` integer NOT NULL,
	PRIMARY KEY(`measurement_id`, `asset_id`),
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`measurement_id`) REFERENCES `measurements`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`asset_id`) REFERENCES `media_assets`(`id`) ON UPDATE no action ON DELETE no action
);
