CREATE TABLE `showcase_exports` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`shop_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`key` text NOT NULL,
	`request` text NOT NULL,
	`pair_ids` text NOT NULL,
	`status` text NOT NULL,
	`progress` real DEFAULT 0 NOT NULL,
	`error_code` text,
	`error_message` text,
	`zip_key` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `showcase_exports_key_unique` ON `showcase_exports` (`key`);--> statement-breakpoint
CREATE INDEX `showcase_exports_shop_status_idx` ON `showcase_exports` (`shop_id`,`status`);